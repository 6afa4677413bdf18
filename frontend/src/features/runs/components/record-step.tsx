import type { RecipeStep, RunDetail } from '@tracewright/shared';

import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { formatDateTime } from '../../../lib/format-date';
import { readingRows } from '../utils/reading-rows';
import { stepTimeline } from '../utils/step-timeline';
import { RecordDeviationsTable } from './record-deviations-table';
import { RecordReadingsTable } from './record-readings-table';
import { RecordTimersTable } from './record-timers-table';
import { StepStateBadge } from './step-state-badge';

type RecordStepProps = { step: RecipeStep; number: number; run: RunDetail };

/** One step of the record: what happened in time order, then its timers, readings and deviations. */
export function RecordStep({ step, number, run }: RecordStepProps) {
  const record = run.steps.find((r) => r.stepId === step.id);
  const timers = run.timers.filter((t) => t.stepId === step.id);
  const rows = readingRows(run.readings.filter((r) => r.stepId === step.id));
  const deviations = run.deviations.filter((d) => d.stepId === step.id);
  const events = stepTimeline(record, timers);
  const titleId = `record-step-${step.id}`;
  return (
    <section aria-labelledby={titleId} className="flex flex-col gap-3 border-t-2 border-graphite-900 pt-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id={titleId} className="text-xl font-bold">
          Step {number}: {step.title}
        </h3>
        <span className="flex flex-wrap items-center gap-3">
          <StepKindLabel kind={step.kind} size="sm" />
          <StepStateBadge state={record?.state ?? 'pending'} />
        </span>
      </div>
      {events.length > 0 ? (
        <ol aria-label={`What happened, step ${number}`} className="flex flex-col gap-1">
          {events.map((e, i) => (
            <li key={`${e.at}-${i}`} className="tabular">
              <time dateTime={e.at} className="font-bold">
                {formatDateTime(e.at, true)}
              </time>{' '}
              {e.what}
              {e.by ? ` · ${e.by}` : ''}
            </li>
          ))}
        </ol>
      ) : (
        <p className="text-graphite-700">Nothing recorded yet.</p>
      )}
      {record?.note ? <p>Operator’s note: {record.note}</p> : null}
      {record?.hasDeviceTime ? <p className="text-sm text-graphite-700">Some times here come from the tablet’s own clock (recorded offline).</p> : null}
      {timers.length > 0 ? <RecordTimersTable caption={`Timers, step ${number}`} step={step} timers={timers} serverTime={run.serverTime} /> : null}
      {rows.length > 0 ? <RecordReadingsTable caption={`Readings, step ${number}`} step={step} rows={rows} run={run} /> : null}
      {deviations.length > 0 ? <RecordDeviationsTable caption={`Deviations, step ${number}`} deviations={deviations} /> : null}
    </section>
  );
}
