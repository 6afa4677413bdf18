import type { BenchStore } from '../storage/bench-store';
import type { OutboxItem, OutboxState } from './outbox-types';

/**
 * The outbox's state for the screen, kept in step with the store: every change is written to
 * the store first, then shown, then announced to subscribers (useSyncExternalStore).
 */
export function createOutboxState(store: BenchStore) {
  const listeners = new Set<() => void>();
  let state: OutboxState = { items: [], phase: 'idle', nextRetryAt: null, lastError: null, notices: [], isLoaded: false, isDurable: store.isDurable };

  const set = (patch: Partial<OutboxState>) => {
    state = { ...state, ...patch, isDurable: store.isDurable };
    listeners.forEach((listener) => listener());
  };

  return {
    get: () => state,
    set,
    subscribe(listener: () => void) {
      listeners.add(listener);
      return () => {
        listeners.delete(listener);
      };
    },
    async save(changed: OutboxItem[]) {
      for (const item of changed) await store.putWrite(item);
      const byId = new Map(changed.map((item) => [item.id, item]));
      set({ items: state.items.map((item) => byId.get(item.id) ?? item) });
    },
    async add(item: OutboxItem) {
      await store.putWrite(item);
      set({ items: [...state.items, item] });
    },
    async remove(gone: OutboxItem[]) {
      for (const item of gone) await store.deleteWrite(item.id);
      const ids = new Set(gone.map((item) => item.id));
      set({ items: state.items.filter((item) => !ids.has(item.id)) });
    },
  };
}
