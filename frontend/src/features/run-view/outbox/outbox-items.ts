import { newKey } from '../utils/new-key';
import { fillRef, refsOf } from './outbox-refs';
import type { OutboxItem, WriteDraft } from './outbox-types';

/** A write waits longer than this in the outbox: the server must take its time from the tablet. */
export const LATE_SEND_MS = 5_000;

type Person = { id: number; name: string };

/** A new outbox item from what the screen asked for, stamped with the tablet's clock. */
export function createItem(draft: WriteDraft, person: Person, seq: number, nowMs: number, madeOffline: boolean): OutboxItem {
  const createdAt = new Date(nowMs).toISOString();
  const body = draft.kind === 'upload-photo' ? null : { ...(draft.body ?? {}), deviceTime: createdAt, madeOffline };
  return {
    id: newKey(),
    idempotencyKey: newKey(),
    seq,
    runId: draft.runId,
    userId: person.id,
    userName: person.name,
    kind: draft.kind,
    path: draft.path,
    body,
    photo: draft.photo ?? null,
    stepId: draft.stepId ?? null,
    createdAt,
    madeOffline,
    status: 'waiting',
    attempts: 0,
    error: null,
    resultId: null,
    sentAt: null,
    meta: draft.meta ?? {},
  };
}

/** A write that waited in the outbox is flagged as made offline, so its device time counts. */
export function stampForSend(item: OutboxItem, nowMs: number): OutboxItem {
  if (item.madeOffline || nowMs - Date.parse(item.createdAt) <= LATE_SEND_MS) return item;
  return { ...item, madeOffline: true, body: item.body === null ? null : { ...item.body, madeOffline: true } };
}

/** The write and every later write that needs its id, in order. */
export function withDependents(items: readonly OutboxItem[], id: string): OutboxItem[] {
  const dropped = new Set([id]);
  for (const item of items) {
    if (refsOf(item).some((ref) => dropped.has(ref))) dropped.add(item.id);
  }
  return items.filter((item) => dropped.has(item.id));
}

/** Later writes that named this one, with its new server id filled in. */
export function filledDependents(items: readonly OutboxItem[], sent: OutboxItem): OutboxItem[] {
  if (sent.resultId === null) return [];
  const resultId = sent.resultId;
  return items
    .filter((item) => item.status !== 'sent' && refsOf(item).includes(sent.id))
    .map((item) => {
      const filled = fillRef(item, sent.id, resultId);
      // The screen finds a write's target (timer, reading) by `meta.target`: keep it pointing right.
      return item.meta.target === sent.id ? { ...filled, meta: { ...filled.meta, target: resultId } } : filled;
    });
}
