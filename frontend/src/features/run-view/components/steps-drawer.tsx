import { travellerSteps } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { StepGlyph } from '../../../components/step-glyphs/step-glyph';
import { useBench } from '../hooks/bench-context';
import { recordOf } from '../utils/bench-run';
import { BenchDialog } from './bench-dialog';
import { benchButton } from './bench-button-styles';
import { HoldRunButton } from './hold-run-button';

const BOX = {
  pending: { icon: 'paused', word: 'To do' },
  'in-progress': { icon: 'hourglass', word: 'In progress' },
  done: { icon: 'check', word: 'Done' },
  'not-done': { icon: 'blocked', word: 'Not done' },
} as const;

/** The traveller's boxes: every step with its state, to jump to any of them. */
export function StepsDrawer({ currentStepId, onClose }: { currentStepId: string; onClose: () => void }) {
  const { run, goToStep } = useBench();
  // The shared traveller rule gives the same numbering and time window as the printed traveller.
  const rows = travellerSteps(run.content.steps, { inks: run.inks, heatSources: [] });
  return (
    <BenchDialog title={`All steps — run ${run.code}`} onClose={onClose} wide>
      <ol className="flex flex-col gap-2">
        {rows.map((row) => {
          const box = BOX[recordOf(run, row.stepId).state];
          const isHere = row.stepId === currentStepId;
          return (
            <li key={row.stepId}>
              <button
                type="button"
                aria-current={isHere ? 'step' : undefined}
                onClick={() => {
                  goToStep(row.stepId);
                  onClose();
                }}
                className={`flex min-h-16 w-full items-center gap-3 rounded-lg border-2 px-3 text-left ${isHere ? 'border-copper-600 bg-copper-50' : 'border-graphite-300 bg-white'}`}
              >
                <span className="flex w-44 shrink-0 items-center gap-1.5 font-bold">
                  <Icon name={box.icon} className="size-6" />
                  {box.word}
                </span>
                <span className="w-8 shrink-0 text-right font-bold tabular">{row.number}</span>
                <StepGlyph kind={row.kind} className="size-7" />
                <span className="flex min-w-0 flex-col">
                  <span className="font-bold">{row.title}</span>
                  <span className="text-base text-graphite-700">
                    {row.kindLabel}
                    {row.timeText ? ` · ${row.timeText}` : ''}
                  </span>
                </span>
              </button>
            </li>
          );
        })}
      </ol>
      <div className="mt-4 flex flex-wrap justify-between gap-2">
        <HoldRunButton />
        <button type="button" className={benchButton('secondary')} onClick={onClose}>
          Back to the step
        </button>
      </div>
    </BenchDialog>
  );
}
