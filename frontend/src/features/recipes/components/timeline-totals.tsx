import type { RecipeTimeline } from '@tracewright/shared';

import { formatMinutes } from '../utils/format-minutes';

/** Total, hands-on and waiting time as big numbers, with a key to the bars below. */
export function TimelineTotals({ timeline }: { timeline: RecipeTimeline }) {
  const items = [
    { label: 'Total', value: timeline.totalMinutes, key: null },
    { label: 'Hands-on', value: timeline.handsOnMinutes, key: 'bg-copper-600' },
    { label: 'Waiting', value: timeline.waitingMinutes, key: 'bg-[repeating-linear-gradient(135deg,var(--color-graphite-400)_0_3px,transparent_3px_6px)]' },
  ];
  return (
    <dl className="grid grid-cols-3 gap-3">
      {items.map((item) => (
        <div key={item.label} className="rounded-md border border-graphite-200 bg-white p-2">
          <dt className="flex items-center gap-2 text-sm text-graphite-700">
            {item.key ? <span aria-hidden="true" className={`inline-block size-3 rounded-sm ${item.key}`} /> : null}
            {item.label}
          </dt>
          <dd className="tabular text-xl font-bold">{formatMinutes(item.value)}</dd>
        </div>
      ))}
    </dl>
  );
}
