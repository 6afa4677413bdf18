import type { BenchStore } from '../storage/bench-store';
import { newKey } from '../utils/new-key';
import { createItem, filledDependents, stampForSend, withDependents } from './outbox-items';
import { createOutboxState } from './outbox-state';
import type { OutboxItem, OutboxPhase, WriteBody, WriteDraft, WriteError } from './outbox-types';
import { classifyFailure, retryDelayMs, toWriteError } from './retry-policy';

export type SendResult = { resultId: number | null };

export interface OutboxOptions {
  store: BenchStore;
  send: (item: OutboxItem) => Promise<SendResult>;
  /** The person signed in now: writes go out only under the name of whoever made them. */
  currentUser: () => { id: number; name: string } | null;
  isOnline?: () => boolean;
  now?: () => number;
  delayMs?: (attempt: number) => number;
  onSent?: (item: OutboxItem) => void;
  /** After a round that sent at least one write: refetch the run. */
  onRoundSent?: () => void;
  /** The store's writes as already read (the run's loader reads them with the run), so the page draws at once. */
  initialItems?: OutboxItem[] | null;
}

export type Outbox = ReturnType<typeof createOutbox>;

/**
 * The outbox: every tablet write is stored first, shown at once, and sent strictly in order
 * with its own Idempotency-Key. See retry-policy.ts for what happens when a send fails.
 */
export function createOutbox(options: OutboxOptions) {
  const { store, send, currentUser } = options;
  const isOnline = options.isOnline ?? (() => navigator.onLine);
  const now = options.now ?? (() => Date.now());
  const delayMs = options.delayMs ?? retryDelayMs;
  const box = createOutboxState(store);
  const { set, save, remove } = box;
  let retryTimer: ReturnType<typeof setTimeout> | null = null;
  let running: Promise<void> | null = null;
  let again = false;
  let loaded: Promise<void> | null = null;
  if (options.initialItems) {
    box.set({ items: options.initialItems, isLoaded: true });
    loaded = Promise.resolve();
  }

  const setPhase = (phase: OutboxPhase, lastError: WriteError | null = null) => set({ phase, lastError });

  function scheduleRetry(attempts: number) {
    if (retryTimer) clearTimeout(retryTimer);
    const wait = delayMs(attempts);
    set({ nextRetryAt: now() + wait });
    retryTimer = setTimeout(() => {
      retryTimer = null;
      void drain();
    }, wait);
  }

  /** Sends from the head until the queue is empty or must wait; true when it sent something. */
  async function round(): Promise<boolean> {
    let sentAny = false;
    const stop = (phase: OutboxPhase, error: WriteError | null = null) => {
      setPhase(phase, error);
      return sentAny;
    };
    for (;;) {
      const head = box.get().items.find((item) => item.status !== 'sent');
      if (!head) return stop('idle');
      if (head.status === 'failed') return stop('blocked', head.error);
      if (currentUser()?.id !== head.userId) return stop('other-person');
      if (!isOnline()) return stop('offline');
      set({ phase: 'sending', nextRetryAt: null });
      const ready = stampForSend(head, now());
      try {
        const { resultId } = await send(ready);
        const sent: OutboxItem = { ...ready, status: 'sent', resultId, sentAt: new Date(now()).toISOString(), error: null };
        await save([sent, ...filledDependents(box.get().items, sent)]);
        sentAny = true;
        options.onSent?.(sent);
      } catch (error) {
        const failure = toWriteError(error);
        const kind = classifyFailure(error);
        if (kind === 'conflict') {
          const dropped = withDependents(box.get().items, ready.id);
          await remove(dropped);
          set({ notices: [...box.get().notices, { id: ready.id, kind: ready.kind, runId: ready.runId, stepId: ready.stepId, message: failure.message, details: failure.details }] });
          continue;
        }
        const attempts = ready.attempts + 1;
        if (kind === 'refused') {
          await save([{ ...ready, attempts, status: 'failed', error: failure }]);
          return stop('blocked', failure);
        }
        await save([{ ...ready, attempts, error: failure }]);
        scheduleRetry(attempts);
        return stop(failure.status === 0 ? 'offline' : 'retrying', failure);
      }
    }
  }

  function drain(): Promise<void> {
    if (running) {
      again = true;
      return running;
    }
    running = (async () => {
      await load();
      let sentAny = false;
      do {
        again = false;
        sentAny = (await round()) || sentAny;
      } while (again);
      if (sentAny) options.onRoundSent?.();
    })()
      .catch((error: unknown) => {
        // The store itself failed (quota, a closed database): say so rather than go quiet.
        console.error('The outbox could not read or write its store.', error);
        setPhase('retrying', toWriteError(error));
      })
      .finally(() => {
        running = null;
        // Asked again after the last round had looked (a write made or the network back just then).
        if (again) {
          again = false;
          void drain();
        }
      });
    return running;
  }

  function load(): Promise<void> {
    loaded ??= store.listWrites().then(
      (items) => set({ items, isLoaded: true }),
      (error: unknown) => {
        // Show the run anyway, saying the kept writes could not be read; the next round reads again.
        loaded = null;
        set({ isLoaded: true, phase: 'retrying', lastError: { status: 0, code: 'INTERNAL', message: 'The writes kept on this tablet could not be read. Keep the tablet on and call your admin.' } });
        throw error;
      },
    );
    return loaded;
  }

  async function enqueue(draft: WriteDraft): Promise<OutboxItem> {
    await load();
    const person = currentUser();
    if (!person) throw new Error('Sign in again before recording anything.');
    const lastSeq = box.get().items.reduce((max, item) => Math.max(max, item.seq), 0);
    const believedOffline = !isOnline() || box.get().phase === 'offline' || box.get().phase === 'retrying';
    const item = createItem(draft, person, Math.max(lastSeq + 1, now()), now(), believedOffline);
    // Stored before it is shown: a write on screen is a write that survives a reload.
    await box.add(item);
    void drain();
    return item;
  }

  /** Drops a refused write and every write that needs it; returns how many went. */
  async function discard(id: string): Promise<number> {
    const dropped = withDependents(box.get().items, id);
    await remove(dropped);
    void drain();
    return dropped.length;
  }

  /** Sends a refused write again. The server recorded nothing for it, so a new key is safe. */
  async function resend(id: string, bodyPatch: WriteBody = {}): Promise<void> {
    const item = box.get().items.find((i) => i.id === id);
    if (!item) return;
    const body = item.body === null ? null : { ...item.body, ...bodyPatch };
    await save([{ ...item, body, status: 'waiting', error: null, idempotencyKey: newKey() }]);
    void drain();
  }

  function retryNow() {
    if (retryTimer) clearTimeout(retryTimer);
    retryTimer = null;
    void drain();
  }

  /** Forgets sent writes once a run fetched after them is on screen. */
  async function purgeSent(requestedAt: string) {
    await remove(box.get().items.filter((item) => item.status === 'sent' && item.sentAt !== null && item.sentAt < requestedAt));
  }

  return {
    getState: box.get,
    subscribe: box.subscribe,
    load,
    enqueue,
    drain,
    retryNow,
    discard,
    resend,
    purgeSent,
    dismissNotice: (id: string) => set({ notices: box.get().notices.filter((n) => n.id !== id) }),
    dispose() {
      if (retryTimer) clearTimeout(retryTimer);
    },
  };
}
