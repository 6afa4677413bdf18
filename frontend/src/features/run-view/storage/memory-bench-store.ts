import type { OutboxItem } from '../outbox/outbox-types';
import type { BenchStore } from './bench-store';
import type { RunSnapshot } from './run-snapshot';

/**
 * The store without IndexedDB: kept for the life of the page only (tests pass `isDurable` to stand
 * in for IndexedDB across a simulated reload). Items are copied in and out,
 * as IndexedDB does, so no caller can change what is stored by holding on to an object.
 */
export function createMemoryBenchStore({ isDurable = false }: { isDurable?: boolean } = {}): BenchStore {
  const writes = new Map<string, OutboxItem>();
  const runs = new Map<number, RunSnapshot>();
  const copy = <T>(value: T): T => ({ ...value });
  return {
    isDurable,
    listWrites: async () => [...writes.values()].sort((a, b) => a.seq - b.seq).map(copy),
    putWrite: async (item) => {
      writes.set(item.id, copy(item));
    },
    deleteWrite: async (id) => {
      writes.delete(id);
    },
    getRunSnapshot: async (runId) => {
      const snapshot = runs.get(runId);
      return snapshot ? copy(snapshot) : undefined;
    },
    putRunSnapshot: async (snapshot) => {
      runs.set(snapshot.runId, copy(snapshot));
    },
  };
}
