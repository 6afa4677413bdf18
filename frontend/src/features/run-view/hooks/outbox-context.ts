import { createContext, useContext, useSyncExternalStore } from 'react';

import type { Outbox } from '../outbox/outbox-engine';
import type { OutboxState } from '../outbox/outbox-types';

export const OutboxContext = createContext<Outbox | null>(null);

export function useOutbox(): Outbox {
  const outbox = useContext(OutboxContext);
  if (!outbox) throw new Error('useOutbox needs the run page around it.');
  return outbox;
}

/** The outbox's items and phase, re-rendering whenever they change. */
export function useOutboxState(): OutboxState {
  const outbox = useOutbox();
  return useSyncExternalStore(outbox.subscribe, outbox.getState, outbox.getState);
}
