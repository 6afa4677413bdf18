import { Icon } from '../../../components/icons/icon';
import { formatDateTime } from '../../../lib/format-date';
import type { BenchDeviation } from '../utils/bench-run';

const SEVERITY = { minor: 'Minor', major: 'Major', critical: 'Critical' } as const;
const STATE = { open: 'open', 'in-review': 'in review', dispositioned: 'dispositioned', closed: 'closed' } as const;

/** Departures recorded on this step (raised by the server or reported here), for the operator to see. */
export function StepDeviations({ deviations }: { deviations: BenchDeviation[] }) {
  if (deviations.length === 0) return null;
  return (
    <section aria-labelledby="step-deviations" className="flex flex-col gap-2 rounded-xl border-2 border-oxide-700 bg-oxide-50 p-4 text-oxide-800">
      <h2 id="step-deviations" className="flex items-center gap-2 text-[1.5rem] font-bold">
        <Icon name="warning" className="size-7" />
        Deviations on this step
      </h2>
      <ul className="flex flex-col gap-2 text-graphite-900">
        {deviations.map((d) => (
          <li key={d.id}>
            <span className="font-bold">{SEVERITY[d.severity]}:</span> {d.title}{' '}
            <span className="text-base text-graphite-700">
              ({d.isPending ? 'waiting to send' : `${STATE[d.state]}, ${formatDateTime(d.createdAt)}`})
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
