import { Icon } from '../../../components/icons/icon';
import { formatDateTime } from '../../../lib/format-date';
import { useOutbox, useOutboxState } from '../hooks/outbox-context';
import type { OutboxState } from '../outbox/outbox-types';
import { timerWords } from '../utils/timer-text';
import { writeLabel } from '../utils/write-labels';
import { BenchDialog } from './bench-dialog';
import { benchButton } from './bench-button-styles';

function phaseWords(state: OutboxState): string {
  switch (state.phase) {
    case 'sending':
      return 'Sending now…';
    case 'offline':
      return 'No network: everything is kept on this tablet and goes out, in order, when the network is back.';
    case 'retrying':
      return `The server is not answering (${state.lastError?.message ?? 'no answer'}). Trying again${state.nextRetryAt ? ` in about ${timerWords(Math.max(1, Math.round((state.nextRetryAt - Date.now()) / 1000)))}` : ' soon'}.`;
    case 'blocked':
      return 'A write was refused; the ones after it wait until you decide about it.';
    case 'other-person':
      return 'The next write belongs to another person; it waits for them to sign in here.';
    case 'idle':
      return 'Everything is saved on the server.';
  }
}

/** The writes still on this tablet, oldest first, and why they wait. */
export function PendingWritesDialog({ onClose }: { onClose: () => void }) {
  const outbox = useOutbox();
  const state = useOutboxState();
  const waiting = state.items.filter((i) => i.status !== 'sent');
  return (
    <BenchDialog title="Saved on this tablet" onClose={onClose} wide>
      <p role="status" className="mb-4">
        {phaseWords(state)}
      </p>
      {waiting.length > 0 ? (
        <ol className="mb-4 flex flex-col gap-2">
          {waiting.map((item) => (
            <li key={item.id} className="flex flex-wrap items-center gap-2 rounded-lg border-2 border-graphite-300 bg-white px-3 py-2">
              <Icon name={item.status === 'failed' ? 'blocked' : 'outbox'} className="size-5" />
              <span className="font-bold">{writeLabel(item)}</span>
              <span className="text-base text-graphite-700">
                {formatDateTime(item.createdAt, true)} · {item.userName}
                {item.status === 'failed' ? ' · refused' : item.attempts > 0 ? ` · tried ${item.attempts}×` : ' · waiting'}
              </span>
            </li>
          ))}
        </ol>
      ) : null}
      <div className="flex flex-wrap justify-end gap-2">
        {waiting.length > 0 && state.phase !== 'blocked' ? (
          <button type="button" className={benchButton('secondary')} onClick={() => outbox.retryNow()}>
            Try sending now
          </button>
        ) : null}
        <button type="button" className={benchButton('primary')} onClick={onClose}>
          Close
        </button>
      </div>
    </BenchDialog>
  );
}
