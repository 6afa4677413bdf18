import type { RunDetail, TravellerStep } from '@tracewright/shared';

import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { CautionLine } from './caution-line';
import { SignOffTable } from './sign-off-table';
import { TravellerReadingsTable } from './traveller-readings-table';

// A step with more reading rows than fit under the previous one starts its own printed page.
const LONG_STEP_ROWS = 8;

export function TravellerStepCard({ step, pieces }: { step: TravellerStep; pieces: RunDetail['pieces'] }) {
  const rowCount = step.readings.reduce((sum, r) => sum + (r.perPiece ? pieces.length : 1), 0);
  const titleId = `traveller-step-${step.stepId}`;
  return (
    <section
      aria-labelledby={titleId}
      className={`flex flex-col gap-3 border-t-2 border-graphite-900 pt-3 break-inside-avoid ${rowCount > LONG_STEP_ROWS ? 'print:break-before-page' : ''}`}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={titleId} className="text-xl font-bold">
          Step {step.number}: {step.title}
        </h3>
        <span className="flex items-center gap-3">
          <StepKindLabel kind={step.kind} size="sm" />
          {step.timeText ? <span className="tabular font-bold">{step.timeText}</span> : null}
        </span>
      </div>
      {step.parameters.length > 0 ? (
        <ul aria-label={`Settings, step ${step.number}`} className="tabular flex flex-wrap gap-x-5 gap-y-1 text-lg">
          {step.parameters.map((text, index) => (
            <li key={`${index}-${text}`}>{text}</li>
          ))}
        </ul>
      ) : null}
      {step.cautions.length > 0 ? (
        <ul aria-label={`Cautions, step ${step.number}`} className="flex flex-col gap-1">
          {step.cautions.map((note) => (
            <CautionLine key={`${note.code}|${note.text}`} note={note} />
          ))}
        </ul>
      ) : null}
      {step.readings.length > 0 ? <TravellerReadingsTable caption={`Readings, step ${step.number}`} readings={step.readings} pieces={pieces} /> : null}
      <SignOffTable caption={`Sign-off, step ${step.number}`} />
    </section>
  );
}
