import type { StepRecordView, TimerView } from '@tracewright/shared';

export type TimelineEvent = { at: string; what: string; by: string | null };

type Person = { name: string } | null;
const event = (at: string | null, what: string, by: Person = null): TimelineEvent[] => (at ? [{ at, what, by: by?.name ?? null }] : []);

/**
 * What happened at one step, oldest first: safety card, start, nozzle check, timers, and how it
 * ended. Readings and deviations have tables of their own.
 */
export function stepTimeline(record: StepRecordView | undefined, timers: readonly TimerView[]): TimelineEvent[] {
  const events: TimelineEvent[] = [
    ...event(record?.safetyAcknowledgedAt ?? null, 'Safety card acknowledged', record?.safetyAcknowledgedBy),
    ...event(record?.startedAt ?? null, 'Step started', record?.startedBy),
    ...event(record?.nozzleCheck?.at ?? null, record?.nozzleCheck?.passed ? 'Nozzle check passed' : 'Nozzle check failed'),
    ...timers.flatMap((t) => [...event(t.startedAt, `Timer “${t.label}” started`, t.startedBy), ...event(t.stoppedAt, `Timer “${t.label}” stopped`)]),
  ];
  if (record?.state === 'done') events.push(...event(record.completedAt, 'Step done', record.completedBy));
  if (record?.state === 'not-done') events.push(...event(record.completedAt, `Closed as not done: ${record.notDoneReason ?? 'no reason given'}`, record.completedBy));
  return events.sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
}
