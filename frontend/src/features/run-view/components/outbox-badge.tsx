import { Icon } from '../../../components/icons/icon';
import { useOutboxState } from '../hooks/outbox-context';
import { useOnline } from '../hooks/use-online';
import { BenchIcon } from './bench-icon';

/**
 * How many writes wait on this tablet, and whether the network is there: always in the header,
 * so nobody closes the tablet thinking it is all saved when it isn't.
 */
export function OutboxBadge({ onOpen }: { onOpen: () => void }) {
  const { items, phase } = useOutboxState();
  const isOnline = useOnline();
  const waiting = items.filter((i) => i.status !== 'sent').length;
  const isOffline = !isOnline || phase === 'offline';
  return (
    <div className="flex flex-wrap items-center gap-2">
      <span role="status" className={`inline-flex items-center gap-1.5 font-bold ${isOffline ? 'text-oxide-700' : 'text-graphite-700'}`}>
        <BenchIcon name={isOffline ? 'noSignal' : 'signal'} className="size-6" />
        {isOffline ? 'Offline' : 'Online'}
      </span>
      <button
        type="button"
        onClick={onOpen}
        className={`inline-flex min-h-12 items-center gap-2 rounded-full border-2 px-3 font-bold ${waiting > 0 ? 'border-amber-700 bg-amber-50 text-amber-800' : 'border-verdigris-700 bg-verdigris-50 text-verdigris-800'}`}
      >
        <Icon name={waiting > 0 ? 'outbox' : 'check'} className="size-5" />
        <span aria-live="polite">{waiting > 0 ? `${waiting} ${waiting === 1 ? 'write' : 'writes'} waiting` : 'All saved'}</span>
      </button>
    </div>
  );
}
