import type { RecipeStep } from '@tracewright/shared';

import { useBench } from '../hooks/bench-context';
import { useClock } from '../hooks/clock-context';
import { remainingSeconds } from '../utils/timer-clock';
import { timerText, timerWords } from '../utils/timer-text';
import { BenchIcon } from './bench-icon';
import { benchButton } from './bench-button-styles';
import { TimerStatus } from './timer-status';

/**
 * Every running timer, whichever step is on screen: its time left, a way to its step, and the
 * acknowledge button once its time is up.
 */
export function TimerTray({ steps, currentStepId }: { steps: RecipeStep[]; currentStepId: string | null }) {
  const { run, clockOffsetMs, goToStep } = useBench();
  const { nowMs, alarms } = useClock();
  const running = run.timers.filter((t) => t.stoppedAt === null);
  if (running.length === 0) return null;

  return (
    <section aria-label="Running timers" className="border-b-2 border-graphite-300 bg-graphite-50 px-4 py-2">
      <ul className="flex flex-wrap gap-2">
        {running.map((timer) => {
          const left = remainingSeconds(timer, nowMs, clockOffsetMs);
          const index = steps.findIndex((s) => s.id === timer.stepId);
          const isAlarming = alarms.isAlarming(timer);
          return (
            <li key={timer.alarmKey} className={`flex flex-wrap items-center gap-3 rounded-lg border-2 bg-white px-3 py-1 ${isAlarming ? 'border-amber-700' : 'border-graphite-300'}`}>
              <BenchIcon name="timer" className="size-7" />
              <span className="flex flex-col">
                <span className="text-base font-bold">{timer.label}</span>
                <span className="text-base text-graphite-700">Step {index + 1}</span>
              </span>
              <span className="text-[2rem] font-bold tabular" aria-hidden="true">
                {left < 0 ? '+' : ''}
                {timerText(left)}
              </span>
              <span className="sr-only">{left < 0 ? `${timerWords(left)} over` : `${timerWords(left)} left`}</span>
              <TimerStatus state={left <= 0 ? 'ended' : 'running'} />
              {isAlarming ? (
                <button type="button" className={benchButton('primary')} onClick={() => alarms.acknowledge(timer)} aria-label={`Acknowledge alarm: ${timer.label}`}>
                  Acknowledge alarm
                </button>
              ) : null}
              {timer.stepId !== currentStepId && index >= 0 ? (
                <button type="button" className={benchButton('secondary')} onClick={() => goToStep(timer.stepId)}>
                  Go to step {index + 1}
                </button>
              ) : null}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
