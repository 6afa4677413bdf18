import type { Substrate, SubstrateWetting } from '@tracewright/shared';

import { AngleCheckPanel } from './angle-check-panel';
import { DetailSection } from './detail-section';
import { OwrkResult } from './owrk-result';

const SOURCE_WORDS = {
  'recorded-parts': 'From the recorded dispersive and polar parts',
  'owrk-contact-angles': 'From the recorded contact angles (Owens & Wendt 1969)',
} as const;

/** The surface energy the checks use (the server's), and a panel to try fresh angles. */
export function SubstrateEnergy({ substrate, wetting }: { substrate: Substrate; wetting: SubstrateWetting }) {
  const energy = wetting.surfaceEnergy;
  return (
    <DetailSection title="Surface energy">
      <div className="flex flex-col gap-5">
        {energy ? (
          <div className="flex flex-col gap-2">
            <p className="font-bold">{SOURCE_WORDS[energy.source]}</p>
            <OwrkResult energy={energy} />
          </div>
        ) : null}
        <p className="max-w-prose text-graphite-700">{wetting.surfaceEnergyNote}</p>
        <AngleCheckPanel waterDeg={substrate.waterContactAngleDeg} diiodomethaneDeg={substrate.diiodomethaneContactAngleDeg} />
      </div>
    </DetailSection>
  );
}
