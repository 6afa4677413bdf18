import type { AuditEvent } from '@tracewright/shared';

import { AuditRow } from './audit-row';

const HEAD = 'sticky top-0 z-10 bg-graphite-100 px-3 py-2 text-left font-bold';
const COLUMNS = ['Time', 'Who', 'Action', 'Record', 'Reason', 'Changes'];

export function AuditTable({ events }: { events: AuditEvent[] }) {
  if (events.length === 0) return <p className="rounded-md border border-graphite-300 bg-white p-4">No events match these filters.</p>;
  return (
    <div className="max-h-[70vh] overflow-auto rounded-md border border-graphite-300 bg-white" tabIndex={0} role="region" aria-label="Audit events table">
      <table className="w-full border-collapse">
        <caption className="sr-only">Audit events, newest first.</caption>
        <thead>
          <tr>
            {COLUMNS.map((c) => (
              <th key={c} scope="col" className={HEAD}>
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {events.map((event) => (
            <AuditRow key={event.id} event={event} />
          ))}
        </tbody>
      </table>
    </div>
  );
}
