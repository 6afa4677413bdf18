import type { BenchStore } from './bench-store';
import { createIdbBenchStore } from './idb-bench-store';
import { createMemoryBenchStore } from './memory-bench-store';

let instance: BenchStore | null = null;

/** The page's one store: IndexedDB when the browser has it, else memory (and the screen says so). */
export function benchStore(): BenchStore {
  instance ??= typeof indexedDB === 'undefined' ? createMemoryBenchStore() : createIdbBenchStore();
  return instance;
}

/** Tests hand in their own store, so a "reload" can find what the last page left behind. */
export function setBenchStore(store: BenchStore | null): void {
  instance = store;
}
