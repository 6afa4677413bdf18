import type { TravellerStep } from '@tracewright/shared';

import { cautionSummary } from '../utils/caution-summary';
import { CautionLine } from './caution-line';

const stepsText = (numbers: number[]) => `(${numbers.length === 1 ? 'step' : 'steps'} ${numbers.join(', ')})`;

/** The run's cautions once each, before the steps: what to have ready before starting. */
export function KeyCautions({ steps }: { steps: TravellerStep[] }) {
  const lines = cautionSummary(steps);
  if (lines.length === 0) return null;
  return (
    <section aria-labelledby="key-cautions-title" className="break-inside-avoid">
      <h2 id="key-cautions-title" className="mb-1 text-lg font-bold">
        Key cautions
      </h2>
      <ul className="flex flex-col gap-1">
        {lines.map((line) => (
          <CautionLine key={`${line.note.code}|${line.note.text}`} note={line.note} suffix={stepsText(line.stepNumbers)} />
        ))}
      </ul>
    </section>
  );
}
