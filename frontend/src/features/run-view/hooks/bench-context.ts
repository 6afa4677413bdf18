import { createContext, useContext } from 'react';

import type { OutboxItem, WriteDraft } from '../outbox/outbox-types';
import type { BenchRun } from '../utils/bench-run';

export type Bench = {
  run: BenchRun;
  /** Server clock minus tablet clock (ms), from the last fresh fetch. */
  clockOffsetMs: number;
  /** False while the run shown is the tablet's saved copy, not a fresh answer. */
  isFresh: boolean;
  person: { id: number; name: string };
  /** Whether step actions may be taken: the run is neither on hold nor finished. */
  isWorkable: boolean;
  goToStep: (stepId: string) => void;
  /** Keeps a write in the outbox (and so on screen); null when even that failed (the toast says why). */
  record: (draft: WriteDraft) => Promise<OutboxItem | null>;
};

export const BenchContext = createContext<Bench | null>(null);

export function useBench(): Bench {
  const bench = useContext(BenchContext);
  if (!bench) throw new Error('useBench needs the run screen around it.');
  return bench;
}
