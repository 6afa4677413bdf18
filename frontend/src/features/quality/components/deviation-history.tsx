import type { DeviationDetail } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';
import { EVENT_WORDS } from '../utils/deviation-looks';
import { DetailSection } from './detail-section';

/** Everything that happened to the deviation, oldest first, as the audit trail has it. */
export function DeviationHistory({ events }: { events: DeviationDetail['events'] }) {
  return (
    <DetailSection title="History">
      {events.length === 0 ? (
        <p className="text-graphite-700">Nothing has happened to this deviation yet.</p>
      ) : (
        <ol className="flex flex-col gap-3 border-l-2 border-graphite-300 pl-4">
          {events.map((event) => (
            <li key={event.id}>
              <p className="text-sm text-graphite-700">
                <span className="tabular">{formatDateTime(event.at)}</span> · {event.by?.name ?? 'Tracewright'}
              </p>
              <p>
                <span className="font-bold">{EVENT_WORDS[event.kind]}:</span> <span className="whitespace-pre-wrap">{event.text}</span>
              </p>
            </li>
          ))}
        </ol>
      )}
    </DetailSection>
  );
}
