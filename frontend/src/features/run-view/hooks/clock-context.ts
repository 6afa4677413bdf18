import { createContext, useContext } from 'react';

import type { TimerAlarms } from './use-timer-alarms';

/** The ticking tablet clock and the alarms it drives; only timer pieces listen, so only they redraw each second. */
export type Clock = { nowMs: number; alarms: TimerAlarms };

export const ClockContext = createContext<Clock | null>(null);

export function useClock(): Clock {
  const clock = useContext(ClockContext);
  if (!clock) throw new Error('useClock needs the timer layer around it.');
  return clock;
}
