import type { OutboxItem } from '../outbox/outbox-types';
import type { RunSnapshot } from './run-snapshot';

/**
 * Where the tablet keeps what must survive a reload: the outbox and the last run detail it saw.
 * IndexedDB in the browser; an in-memory store where there is none (and in tests).
 */
export interface BenchStore {
  readonly isDurable: boolean;
  /** Every write, oldest first (by `seq`). */
  listWrites(): Promise<OutboxItem[]>;
  putWrite(item: OutboxItem): Promise<void>;
  deleteWrite(id: string): Promise<void>;
  getRunSnapshot(runId: number): Promise<RunSnapshot | undefined>;
  putRunSnapshot(snapshot: RunSnapshot): Promise<void>;
}
