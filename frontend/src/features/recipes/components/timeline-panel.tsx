import type { RecipeStep } from '@tracewright/shared';

import { StepGlyph } from '../../../components/step-glyphs/step-glyph';
import type { DraftEvaluation } from '../utils/evaluate-draft';
import { formatMinutes } from '../utils/format-minutes';
import { TimelineTotals } from './timeline-totals';

type TimelinePanelProps = { evaluation: Pick<DraftEvaluation, 'timeline' | 'inkUse'>; steps: readonly RecipeStep[] };

const formatMicrolitres = (ul: number) => `${ul < 10 ? ul.toFixed(2) : ul.toFixed(1)} µL`;

/** How long one piece takes, step by step: hands-on time solid, waiting time hatched. */
export function TimelinePanel({ evaluation, steps }: TimelinePanelProps) {
  const { timeline, inkUse } = evaluation;
  const longest = Math.max(1, ...timeline.steps.map((t) => t.minutes));
  const stepOf = new Map(steps.map((s, i) => [s.id, { step: s, n: i + 1 }]));

  return (
    <section aria-labelledby="timeline-title" className="flex min-w-0 flex-col gap-3">
      <h2 id="timeline-title" className="text-lg font-bold">
        Timeline
      </h2>
      <TimelineTotals timeline={timeline} />
      <ol className="flex flex-col gap-2">
        {timeline.steps.map((t) => {
          const entry = stepOf.get(t.stepId);
          if (!entry) return null;
          const ink = inkUse.get(t.stepId);
          return (
            <li key={t.stepId} className="grid grid-cols-[minmax(0,11rem)_1fr] items-center gap-3 text-sm">
              <span className="flex min-w-0 items-center gap-2">
                <StepGlyph kind={entry.step.kind} className="size-4 text-graphite-600" />
                <span className="truncate">
                  <span className="tabular">{entry.n}.</span> {entry.step.title}
                </span>
              </span>
              <span className="flex min-w-0 flex-col gap-1">
                <span className="flex h-3 overflow-hidden rounded-sm bg-graphite-100" style={{ width: `${Math.max(2, (t.minutes / longest) * 100)}%` }} aria-hidden="true">
                  <span className="h-full bg-copper-600" style={{ width: `${t.minutes > 0 ? (t.handsOnMinutes / t.minutes) * 100 : 0}%` }} />
                  <span className="h-full flex-1 bg-[repeating-linear-gradient(135deg,var(--color-graphite-400)_0_3px,transparent_3px_6px)]" />
                </span>
                <span className="tabular text-graphite-700">
                  {formatMinutes(t.minutes)}, {formatMinutes(t.handsOnMinutes)} hands-on
                  {ink !== undefined ? ` · ink ≈ ${formatMicrolitres(ink)} per piece` : ''}
                </span>
              </span>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
