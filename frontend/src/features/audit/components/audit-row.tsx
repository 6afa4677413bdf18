import { useId, useState } from 'react';

import type { AuditEvent } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { formatDateTime } from '../../../lib/format-date';
import { AuditChanges } from './audit-changes';

const CELL = 'border-t border-graphite-200 px-3 py-2 align-top';

export function AuditRow({ event }: { event: AuditEvent }) {
  const [isOpen, setIsOpen] = useState(false);
  const detailsId = useId();
  const hasChanges = event.before !== null || event.after !== null;

  return (
    <>
      <tr>
        <td className={`${CELL} tabular whitespace-nowrap`}>
          <time dateTime={event.at}>{formatDateTime(event.at, true)}</time>
        </td>
        <td className={CELL}>{event.actorName ?? 'System'}</td>
        <td className={`${CELL} font-mono text-sm`}>{event.action}</td>
        <td className={CELL}>
          {event.entityType}
          {event.entityId ? <span className="text-graphite-600"> #{event.entityId}</span> : null}
        </td>
        <td className={CELL}>{event.reason ?? ''}</td>
        <td className={CELL}>
          {hasChanges ? (
            <button
              type="button"
              aria-expanded={isOpen}
              aria-controls={detailsId}
              onClick={() => setIsOpen((v) => !v)}
              className="inline-flex min-h-11 items-center gap-1 rounded-md px-2 font-bold text-copper-700 hover:bg-copper-50"
            >
              <Icon name={isOpen ? 'chevronDown' : 'chevronRight'} className="size-4" />
              {isOpen ? 'Hide changes' : 'Show changes'}
              <span className="sr-only"> of event {event.id}</span>
            </button>
          ) : (
            <span className="text-graphite-600">None</span>
          )}
        </td>
      </tr>
      {isOpen ? (
        <tr id={detailsId}>
          <td colSpan={6} className="border-t border-graphite-100 bg-paper px-3 py-3">
            <AuditChanges event={event} />
          </td>
        </tr>
      ) : null}
    </>
  );
}
