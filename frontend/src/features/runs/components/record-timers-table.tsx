import { timerElapsedSeconds, timerOutcome, type RecipeStep, type TimerView } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { formatDateTime } from '../../../lib/format-date';
import { durationText } from '../utils/duration-text';

const HEAD = 'border-b border-graphite-900 bg-graphite-100 px-2 py-1 text-left font-bold print:bg-transparent';
const CELL = 'border-b border-graphite-300 px-2 py-1 align-top';

function Outcome({ step, timer }: { step: RecipeStep; timer: TimerView }) {
  if (timer.stoppedAt === null) return <StatusBadge tone="info" label="Running" icon="hourglass" />;
  const outcome = timerOutcome(step, { startedAt: new Date(timer.startedAt) }, new Date(timer.stoppedAt));
  if (outcome.endedEarly) return <StatusBadge tone="warning" label="Ended early" />;
  if (outcome.overMaximum) return <StatusBadge tone="warning" label="Over the longest time" />;
  return <StatusBadge tone="pass" label="On time" />;
}

type RecordTimersTableProps = { caption: string; step: RecipeStep; timers: TimerView[]; serverTime: string };

export function RecordTimersTable({ caption, step, timers, serverTime }: RecordTimersTableProps) {
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-1 text-left font-bold">{caption}</caption>
      <thead>
        <tr>
          <th scope="col" className={HEAD}>Timer</th>
          <th scope="col" className={HEAD}>Set for</th>
          <th scope="col" className={HEAD}>Started</th>
          <th scope="col" className={HEAD}>Stopped</th>
          <th scope="col" className={HEAD}>Ran for</th>
          <th scope="col" className={HEAD}>Against the step’s times</th>
        </tr>
      </thead>
      <tbody>
        {timers.map((timer) => {
          const ran = timerElapsedSeconds({ startedAt: new Date(timer.startedAt), stoppedAt: timer.stoppedAt ? new Date(timer.stoppedAt) : null }, new Date(serverTime));
          return (
            <tr key={timer.id}>
              <th scope="row" className={`${CELL} text-left`}>{timer.label}</th>
              <td className={`${CELL} tabular`}>{durationText(timer.plannedSeconds)}</td>
              <td className={`${CELL} tabular`}>
                {formatDateTime(timer.startedAt)} {timer.startedBy ? `by ${timer.startedBy.name}` : ''}
                {timer.startedOnDeviceClock ? <span className="block text-graphite-700">tablet clock, offline</span> : null}
              </td>
              <td className={`${CELL} tabular`}>{timer.stoppedAt ? formatDateTime(timer.stoppedAt) : '—'}</td>
              <td className={`${CELL} tabular`}>{durationText(ran)}</td>
              <td className={CELL}>
                <Outcome step={step} timer={timer} />
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
