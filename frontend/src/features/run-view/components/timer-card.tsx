import { useState } from 'react';

import { timerOutcome, type RecipeStep } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';
import { useBench } from '../hooks/bench-context';
import { useClock } from '../hooks/clock-context';
import type { BenchTimer } from '../utils/bench-run';
import { remainingSeconds, timerNow } from '../utils/timer-clock';
import { timerText, timerWords } from '../utils/timer-text';
import { writeDrafts } from '../utils/write-drafts';
import { benchButton } from './bench-button-styles';
import { ReasonDialog } from './reason-dialog';
import { TimerRing } from './timer-ring';
import { TimerStatus, type TimerState } from './timer-status';

type TimerCardProps = { timer: BenchTimer; step: RecipeStep };

/** One timer, large: the ring, the time left (or over), and its stop and acknowledge buttons. */
export function TimerCard({ timer, step }: TimerCardProps) {
  const { run, clockOffsetMs, record, isWorkable } = useBench();
  const { nowMs, alarms } = useClock();
  const [askWhy, setAskWhy] = useState<string | null>(null);
  const left = remainingSeconds(timer, nowMs, clockOffsetMs);
  const state: TimerState = timer.stoppedAt ? 'stopped' : left <= 0 ? 'ended' : 'running';
  const isAlarming = alarms.isAlarming(timer);

  const stop = (reason: string | null) => {
    setAskWhy(null);
    // A timer still in the outbox is named by the write that starts it; the outbox fills in its id.
    void record(writeDrafts.stopTimer(run.id, step.id, timer.id > 0 || !timer.localRef ? timer.id : timer.localRef, reason));
  };
  const onStop = () => {
    const outcome = timerOutcome(step, { startedAt: new Date(timer.startedAt) }, timerNow(timer, nowMs, clockOffsetMs));
    if (outcome.endedEarly) return setAskWhy(`Stopping before the shortest time of ${step.minMinutes} min raises a deviation.`);
    if (outcome.overMaximum) return setAskWhy(`Stopping after the longest time of ${step.maxMinutes} min raises a deviation.`);
    stop(null);
  };

  const over = left < 0;
  return (
    <section
      aria-label={`Timer ${timer.label}`}
      className={`flex flex-wrap items-center gap-5 rounded-xl border-2 bg-white p-4 ${isAlarming ? 'border-amber-700 bg-amber-50' : 'border-graphite-300'}`}
    >
      <TimerRing fraction={timer.plannedSeconds > 0 ? left / timer.plannedSeconds : 0} state={state} />
      <div className="flex min-w-0 flex-1 flex-col gap-2">
        <div className="flex flex-wrap items-center gap-2">
          <TimerStatus state={state} />
          {timer.isPending ? <span className="text-base font-bold text-graphite-700">Waiting to send</span> : null}
        </div>
        <p className="text-[4.5rem] font-bold leading-none tabular" aria-hidden="true">
          {over ? '+' : ''}
          {timerText(left)}
        </p>
        <p className="sr-only">{over ? `${timerWords(left)} over` : `${timerWords(left)} left`}</p>
        <p className="text-graphite-700">
          {over ? 'over' : 'left'} of {timerText(timer.plannedSeconds)} · {timer.label}
          {timer.startedOnDeviceClock ? ' · on this tablet’s clock' : ''}
          {timer.stoppedAt ? ` · stopped ${formatDateTime(timer.stoppedAt)}` : ''}
        </p>
        {timer.stoppedAt === null && isWorkable ? (
          <div className="flex flex-wrap gap-2">
            {isAlarming ? (
              <button type="button" className={benchButton('primary')} onClick={() => alarms.acknowledge(timer)}>
                Acknowledge alarm
              </button>
            ) : null}
            <button type="button" className={benchButton('secondary')} onClick={onStop}>
              Stop timer
            </button>
          </div>
        ) : null}
      </div>
      {askWhy ? (
        <ReasonDialog title="Why stop now?" label="Reason" submitLabel="Stop timer" onSubmit={stop} onClose={() => setAskWhy(null)}>
          <p>{askWhy}</p>
        </ReasonDialog>
      ) : null}
    </section>
  );
}
