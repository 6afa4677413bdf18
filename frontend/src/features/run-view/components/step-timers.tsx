import type { RecipeStep, StepRecordView } from '@tracewright/shared';

import { useBench } from '../hooks/bench-context';
import { plannedTimerSeconds } from '../utils/planned-timer';
import { timerText } from '../utils/timer-text';
import { writeDrafts } from '../utils/write-drafts';
import { BenchIcon } from './bench-icon';
import { benchButton } from './bench-button-styles';
import { TimerCard } from './timer-card';

type StepTimersProps = { step: RecipeStep; record: StepRecordView };

/** The step's timers and the button that starts one, with the planned length on it. */
export function StepTimers({ step, record }: StepTimersProps) {
  const { run, record: keep, isWorkable } = useBench();
  const planned = plannedTimerSeconds(step);
  const timers = run.timers.filter((t) => t.stepId === step.id);
  if (planned === null && timers.length === 0) return null;

  const isRunning = timers.some((t) => t.stoppedAt === null);
  const canStart = isWorkable && record.state === 'in-progress' && !isRunning;
  const why = record.state !== 'in-progress' ? 'Start the step first.' : isRunning ? 'A timer is already running for this step.' : null;

  return (
    <section aria-labelledby={`timers-${step.id}`} className="flex flex-col gap-3">
      <h2 id={`timers-${step.id}`} className="text-[1.5rem] font-bold">
        Timer
      </h2>
      {planned !== null ? (
        <div className="flex flex-wrap items-center gap-3">
          <button
            type="button"
            className={benchButton('secondary')}
            aria-disabled={!canStart}
            aria-describedby={!canStart && why ? `timer-why-${step.id}` : undefined}
            onClick={() => {
              if (canStart) void keep(writeDrafts.startTimer(run.id, step.id, step.title.slice(0, 80), planned));
            }}
          >
            <BenchIcon name="timer" />
            Start timer ({timerText(planned)})
          </button>
          {!canStart && why && isWorkable ? (
            <p id={`timer-why-${step.id}`} className="text-graphite-700">
              {why}
            </p>
          ) : null}
        </div>
      ) : null}
      {timers.map((timer) => (
        <TimerCard key={timer.alarmKey} timer={timer} step={step} />
      ))}
    </section>
  );
}
