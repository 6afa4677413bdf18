import { openDB, type DBSchema, type IDBPDatabase } from 'idb';

import type { OutboxItem } from '../outbox/outbox-types';
import type { BenchStore } from './bench-store';
import { createMemoryBenchStore } from './memory-bench-store';
import type { RunSnapshot } from './run-snapshot';

const DB_NAME = 'tracewright-bench';
const DB_VERSION = 1;

interface BenchDb extends DBSchema {
  outbox: { key: string; value: OutboxItem; indexes: { bySeq: number } };
  runs: { key: number; value: RunSnapshot };
}

/**
 * The outbox and run snapshots in IndexedDB: they outlive reloads, crashes and lost Wi-Fi. If the
 * browser refuses the database (private window, no quota), writes still work for this page and
 * `isDurable` turns false so the screen can warn that a reload would lose them.
 */
export function createIdbBenchStore(): BenchStore {
  const fallback = createMemoryBenchStore();
  let isDurable = true;
  const opened: Promise<IDBPDatabase<BenchDb> | null> = openDB<BenchDb>(DB_NAME, DB_VERSION, {
    upgrade(database) {
      const outbox = database.createObjectStore('outbox', { keyPath: 'id' });
      outbox.createIndex('bySeq', 'seq');
      database.createObjectStore('runs', { keyPath: 'runId' });
    },
  }).catch((error: unknown) => {
    console.error('IndexedDB is not available; writes are kept in memory only.', error);
    isDurable = false;
    return null;
  });
  return {
    get isDurable() {
      return isDurable;
    },
    listWrites: async () => {
      const db = await opened;
      return db ? db.getAllFromIndex('outbox', 'bySeq') : fallback.listWrites();
    },
    putWrite: async (item) => {
      const db = await opened;
      await (db ? db.put('outbox', item) : fallback.putWrite(item));
    },
    deleteWrite: async (id) => {
      const db = await opened;
      await (db ? db.delete('outbox', id) : fallback.deleteWrite(id));
    },
    getRunSnapshot: async (runId) => {
      const db = await opened;
      return db ? db.get('runs', runId) : fallback.getRunSnapshot(runId);
    },
    putRunSnapshot: async (snapshot) => {
      const db = await opened;
      await (db ? db.put('runs', snapshot) : fallback.putRunSnapshot(snapshot));
    },
  };
}
