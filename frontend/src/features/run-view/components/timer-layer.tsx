import { useEffect, useMemo, type ReactNode } from 'react';

import { ClockContext } from '../hooks/clock-context';
import { useNow } from '../hooks/use-now';
import { useTimerAlarms } from '../hooks/use-timer-alarms';
import { useWakeLock } from '../hooks/use-wake-lock';
import { unlockAlarmSound } from '../utils/alarm-sound';
import type { BenchTimer } from '../utils/bench-run';

type TimerLayerProps = { timers: BenchTimer[]; clockOffsetMs: number; children: ReactNode };

/**
 * Owns the one ticking clock of the page, the alarms, the screen wake lock and the live region
 * that announces a timer's end. Its children are passed in, so a tick redraws only the pieces
 * that read the clock.
 */
export function TimerLayer({ timers, clockOffsetMs, children }: TimerLayerProps) {
  const nowMs = useNow();
  const alarms = useTimerAlarms(timers, nowMs, clockOffsetMs);
  useWakeLock(timers.some((t) => t.stoppedAt === null));

  useEffect(() => {
    // The first tap anywhere lets the page make sound later (browsers' autoplay rule).
    const unlock = () => unlockAlarmSound();
    window.addEventListener('pointerdown', unlock, { once: true });
    window.addEventListener('keydown', unlock, { once: true });
    return () => {
      window.removeEventListener('pointerdown', unlock);
      window.removeEventListener('keydown', unlock);
    };
  }, []);

  const clock = useMemo(() => ({ nowMs, alarms }), [nowMs, alarms]);
  return (
    <ClockContext.Provider value={clock}>
      {children}
      <p role="alert" className="sr-only">
        {alarms.announcement}
      </p>
    </ClockContext.Provider>
  );
}
