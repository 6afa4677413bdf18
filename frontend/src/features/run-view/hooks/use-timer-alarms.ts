import { useCallback, useEffect, useRef, useState } from 'react';

import { alarmAcks } from '../utils/alarm-acks';
import { playAlarmTone, vibrateAlarm } from '../utils/alarm-sound';
import type { BenchTimer } from '../utils/bench-run';
import { remainingSeconds } from '../utils/timer-clock';

export type TimerAlarms = {
  /** Ended, running and not yet acknowledged: the ring is amber and the alarm repeats. */
  isAlarming: (timer: BenchTimer) => boolean;
  acknowledge: (timer: BenchTimer) => void;
  /** The latest alarm in words, for the page's live region. */
  announcement: string;
};

/**
 * Rings for every running timer that has reached zero: a tone, a buzz and an announcement, then
 * again each full minute over, until the operator acknowledges it. Acknowledgements are kept on
 * the tablet, so a reload does not ring an alarm already answered.
 */
export function useTimerAlarms(timers: readonly BenchTimer[], nowMs: number, clockOffsetMs: number): TimerAlarms {
  const lastRung = useRef(new Map<string, number>());
  const [acked, setAcked] = useState<ReadonlySet<string>>(() => new Set(timers.map((t) => t.alarmKey).filter(alarmAcks.has)));
  const [announcement, setAnnouncement] = useState('');

  const isAcked = useCallback((timer: BenchTimer) => acked.has(timer.alarmKey) || alarmAcks.has(timer.alarmKey), [acked]);
  const isAlarming = useCallback(
    (timer: BenchTimer) => timer.stoppedAt === null && remainingSeconds(timer, nowMs, clockOffsetMs) <= 0 && !isAcked(timer),
    [nowMs, clockOffsetMs, isAcked],
  );

  useEffect(() => {
    for (const timer of timers) {
      if (!isAlarming(timer)) continue;
      const minutesOver = Math.floor(-remainingSeconds(timer, nowMs, clockOffsetMs) / 60);
      if (lastRung.current.get(timer.alarmKey) === minutesOver) continue;
      lastRung.current.set(timer.alarmKey, minutesOver);
      playAlarmTone();
      vibrateAlarm();
      const over = minutesOver > 0 ? `, ${minutesOver} min over` : '';
      setAnnouncement(`Time is up: ${timer.label}${over}. Acknowledge the alarm on the timer.`);
    }
  }, [timers, nowMs, clockOffsetMs, isAlarming]);

  const acknowledge = useCallback((timer: BenchTimer) => {
    alarmAcks.add(timer.alarmKey);
    setAcked((current) => new Set([...current, timer.alarmKey]));
    setAnnouncement(`Alarm acknowledged: ${timer.label}.`);
  }, []);

  return { isAlarming, acknowledge, announcement };
}
