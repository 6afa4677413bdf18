import type { RecipeStep, StepRecordView } from '@tracewright/shared';

import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { formatDateTime } from '../../../lib/format-date';
import { StepStateBadge } from './step-state-badge';

function who(record: StepRecordView): string | null {
  if (record.state === 'done' && record.completedAt) return `Done by ${record.completedBy?.name ?? 'someone'} at ${formatDateTime(record.completedAt)}`;
  if (record.state === 'not-done' && record.completedAt) return `Closed as not done by ${record.completedBy?.name ?? 'someone'} at ${formatDateTime(record.completedAt)}: ${record.notDoneReason ?? ''}`;
  if (record.startedAt) return `Started by ${record.startedBy?.name ?? 'someone'} at ${formatDateTime(record.startedAt)}`;
  return null;
}

/** The step's kind (glyph and name), number, title and state, and who moved it last. */
export function StepHeading({ step, number, total, record }: { step: RecipeStep; number: number; total: number; record: StepRecordView }) {
  const line = who(record);
  return (
    <header className="flex flex-col gap-2 border-l-4 border-graphite-300 pl-4">
      <div className="flex flex-wrap items-center gap-3">
        <StepKindLabel kind={step.kind} size="lg" />
        <span className="text-graphite-700">
          Step {number} of {total}
        </span>
        <StepStateBadge state={record.state} />
      </div>
      <h1 id="step-title" tabIndex={-1} className="text-[2.25rem] font-bold leading-tight">
        {step.title}
      </h1>
      {line ? <p className="text-graphite-700">{line}</p> : null}
    </header>
  );
}
