import type { SafetyNote, StepRecordView } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { formatDateTime } from '../../../lib/format-date';
import { useBench } from '../hooks/bench-context';
import { cautionCodes } from '../utils/caution-codes';
import { writeDrafts } from '../utils/write-drafts';
import { BenchIcon } from './bench-icon';
import { benchButton } from './bench-button-styles';

type SafetyCardProps = { stepId: string; notes: SafetyNote[]; record: StepRecordView };

function Caution({ note }: { note: SafetyNote }) {
  const { hazards, pictograms } = cautionCodes(note.text);
  return (
    <li className="flex gap-3">
      <Icon name="warning" className="mt-1 size-6 text-amber-800" />
      <div className="flex flex-col gap-1">
        <p>
          <span className="font-bold">{note.severity === 'danger' ? 'Danger: ' : 'Caution: '}</span>
          {note.text}
        </p>
        {hazards.length + pictograms.length > 0 ? (
          <p className="flex flex-wrap gap-1.5">
            <span className="sr-only">Codes:</span>
            {[...pictograms, ...hazards].map((code) => (
              <span key={code} className="rounded border-2 border-graphite-700 bg-white px-2 text-base font-bold tabular">
                {code}
              </span>
            ))}
          </p>
        ) : null}
      </div>
    </li>
  );
}

/**
 * The cautions of a heat, solvent, solder or press step, which the operator acknowledges
 * (recorded with their name) before the step can start.
 */
export function SafetyCard({ stepId, notes, record }: SafetyCardProps) {
  const { run, record: keep, isWorkable } = useBench();
  const acknowledged = record.safetyAcknowledgedAt;
  const cautions = (
    <>
      <ul className="flex flex-col gap-3 text-graphite-900">
        {notes.map((note) => (
          <Caution key={note.code} note={note} />
        ))}
      </ul>
      <p className="flex items-start gap-2 text-graphite-900">
        <BenchIcon name="glove" className="mt-1 size-6" />
        Wear the gloves and use the ventilation these cautions name. The safety data sheet of each ink and solvent decides wherever it says more.
      </p>
    </>
  );
  return (
    <section aria-labelledby={`safety-${stepId}`} className={`flex flex-col gap-4 rounded-xl border-amber-700 bg-amber-50 text-amber-800 ${acknowledged ? 'border-2 px-4 py-2' : 'border-4 p-4'}`}>
      <div className="flex flex-wrap items-center gap-x-6 gap-y-2">
        <h2 id={`safety-${stepId}`} className="flex items-center gap-2 text-[1.5rem] font-bold">
          <BenchIcon name="shield" className="size-8" />
          Safety first
        </h2>
        {acknowledged ? (
          <p role="status" className="flex items-center gap-2 font-bold text-verdigris-800">
            <Icon name="check" className="size-6" />
            Acknowledged by {record.safetyAcknowledgedBy?.name ?? 'someone'} at {formatDateTime(acknowledged)}
          </p>
        ) : null}
      </div>
      {acknowledged ? (
        <>
          {/* Read and acknowledged: folded away so the step itself fits the screen, one tap to see again. */}
          <details className="-mt-3">
            <summary className="min-h-12 cursor-pointer py-2 font-bold text-graphite-900">Show the cautions again</summary>
            <div className="flex flex-col gap-3">{cautions}</div>
          </details>
        </>
      ) : (
        <>
          {cautions}
          <button
            type="button"
            className={benchButton('primary', 'self-start')}
            disabled={!isWorkable}
            onClick={() => void keep(writeDrafts.acknowledgeSafety(run.id, stepId, notes.map((n) => n.code)))}
          >
            <Icon name="check" className="size-6" />I have read these cautions
          </button>
        </>
      )}
    </section>
  );
}
