import type { Ink } from '@tracewright/shared';

import { Notice } from '../../../components/ui/notice';
import { DetailSection } from './detail-section';
import { SolventCaution } from './solvent-caution';

/** The ink's solvents as cautions, always ending with the safety data sheet as the authority. */
export function InkCautions({ ink }: { ink: Ink }) {
  return (
    <DetailSection title="Solvents and cautions">
      <div className="flex flex-col gap-4">
        {ink.solvents.length === 0 ? (
          <p className="text-graphite-700">No solvents recorded for this ink.</p>
        ) : (
          <ul className="flex flex-col gap-4">
            {ink.solvents.map((solvent, i) => (
              <SolventCaution key={`${solvent.name}-${i}`} solvent={solvent} />
            ))}
          </ul>
        )}
        <Notice tone="warning" title="The supplier’s safety data sheet comes first.">
          <p>
            This is a summary to recognise the hazards at a glance. Before handling, read the safety data sheet for this ink and follow its
            advice, your local rules and your lab’s own practice.
          </p>
        </Notice>
      </div>
    </DetailSection>
  );
}
