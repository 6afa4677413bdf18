import { Link } from 'react-router';

import { Notice } from '../../../components/ui/notice';
import { formatDateTime } from '../../../lib/format-date';
import { useBench } from '../hooks/bench-context';
import { useOutbox, useOutboxState } from '../hooks/outbox-context';
import type { WriteNotice } from '../outbox/outbox-types';
import { recordOf } from '../utils/bench-run';
import { benchButton } from './bench-button-styles';
import { RefusedWrite } from './refused-write';

function conflictWords(notice: WriteNotice, run: ReturnType<typeof useBench>['run']): string {
  if (notice.kind !== 'complete-step' || notice.stepId === null) return notice.message;
  const record = recordOf(run, notice.stepId);
  const number = run.content.steps.findIndex((s) => s.id === notice.stepId) + 1;
  if (record.completedAt) return `Step ${number} was already marked done by ${record.completedBy?.name ?? 'someone'} at ${formatDateTime(record.completedAt)}. Nothing was lost.`;
  return `Step ${number} was already marked done on another tablet. Nothing was lost.`;
}

/** What the outbox needs the operator to know: a refused write, writes waiting for their author, writes done elsewhere. */
export function OutboxAlerts() {
  const { run } = useBench();
  const outbox = useOutbox();
  const { items, phase, notices, isDurable, lastError } = useOutboxState();
  const refused = items.find((i) => i.status === 'failed');
  const head = items.find((i) => i.status !== 'sent');
  return (
    <div className="flex flex-col">
      {!isDurable ? (
        <div className="px-4 py-2">
          <Notice tone="warning" title="This browser can’t keep writes through a reload." role="status">
            <p>Keep this page open until the header says “All saved”.</p>
          </Notice>
        </div>
      ) : null}
      {refused ? <RefusedWrite item={refused} items={items} /> : null}
      {phase === 'retrying' && lastError ? (
        <div className="px-4 py-2">
          <Notice tone="warning" title="Writes are kept on this tablet for now." role="status">
            <p>{lastError.message} They are tried again by themselves.</p>
          </Notice>
        </div>
      ) : null}
      {phase === 'other-person' && head ? (
        <div className="px-4 py-2">
          <Notice tone="warning" title={`Writes by ${head.userName} are waiting for them.`} role="status">
            <p>
              They go out only under the name of the person who made them.{' '}
              <Link to={`/pin?next=${encodeURIComponent(`/run/${run.id}`)}`} className="font-bold text-copper-700 underline">
                Switch to {head.userName}
              </Link>{' '}
              to send them.
            </p>
          </Notice>
        </div>
      ) : null}
      {notices.map((notice) => (
        <div key={notice.id} className="flex flex-wrap items-start gap-2 px-4 py-2">
          <Notice tone="info" title="Already done elsewhere" role="status">
            <p>{conflictWords(notice, run)}</p>
          </Notice>
          <button type="button" className={benchButton('secondary')} onClick={() => outbox.dismissNotice(notice.id)}>
            OK
          </button>
        </div>
      ))}
    </div>
  );
}
