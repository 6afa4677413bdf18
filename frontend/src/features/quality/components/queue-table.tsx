import type { DeviationQueue } from '@tracewright/shared';

import { QueueRow } from './queue-row';

const HEAD = 'sticky top-0 z-10 whitespace-nowrap bg-graphite-100 px-3 py-2 font-bold';

export function QueueTable({ items }: { items: DeviationQueue['items'] }) {
  return (
    // The scroll box keeps the header in view (sticky) while a long page scrolls.
    <div className="max-h-[70vh] overflow-auto rounded-md border border-graphite-300 bg-white" tabIndex={0} role="region" aria-label="Deviations table">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Deviations in the chosen order. Each title opens the deviation.</caption>
        <thead>
          <tr>
            <th scope="col" className={HEAD}>Severity</th>
            <th scope="col" className={HEAD}>Deviation</th>
            <th scope="col" className={HEAD}>Run</th>
            <th scope="col" className={HEAD}>Recipe</th>
            <th scope="col" className={HEAD}>Step kind</th>
            <th scope="col" className={HEAD}>State</th>
            <th scope="col" className={HEAD}>Assignee</th>
            <th scope="col" className={`${HEAD} text-right`}>Age</th>
          </tr>
        </thead>
        <tbody>
          {items.map((item) => (
            <QueueRow key={item.id} item={item} />
          ))}
        </tbody>
      </table>
    </div>
  );
}
