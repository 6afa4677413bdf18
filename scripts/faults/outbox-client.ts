import { setTimeout as sleep } from 'node:timers/promises';

import type { PlannedWrite } from './round-plan';
import { postOnce, type Attempt } from './tablet-session';

/** How one write fared: every attempt, the acknowledging one, and why it failed if it did. */
export interface WriteOutcome {
  write: PlannedWrite;
  attempts: Attempt[];
  acknowledged: Attempt | null;
  failure: string | null;
}

/** Answers the outbox sends again, unchanged and with the same key: the server or its database is away. */
const isRetryable = (status: number) => status === 503 || status === 0;

/**
 * Sends one write the way the tablet's outbox does: same body, same Idempotency-Key, again and
 * again until it is acknowledged. Only 2xx counts: every planned write is valid and made once, so a
 * 409 or 422 here would mean the server lost or mixed up a key. The backoff is shorter than the
 * server's Retry-After on purpose, to put as many requests as possible on the outage.
 */
export async function deliver(write: PlannedWrite, deadline: number, onAcknowledged: () => void): Promise<WriteOutcome> {
  const attempts: Attempt[] = [];
  let failure: string | null = null;
  for (let retry = 0; Date.now() < deadline; retry += 1) {
    const attempt = await postOnce(write.session, write.path, write.body, write.key);
    attempts.push(attempt);
    if (attempt.status >= 200 && attempt.status < 300) {
      onAcknowledged();
      return { write, attempts, acknowledged: attempt, failure };
    }
    if (attempt.status === -1) {
      // A hang fails the round, but the write is still sent until it lands, so its row can be checked.
      failure ??= `no answer within the time limit (${attempt.error ?? ''})`;
    } else if (!isRetryable(attempt.status)) {
      return { write, attempts, acknowledged: null, failure: `answered ${attempt.status}: ${JSON.stringify(attempt.body).slice(0, 300)}` };
    }
    const base = Math.min(1_000, 100 * 2 ** retry);
    await sleep(base / 2 + Math.random() * (base / 2));
  }
  return { write, attempts, acknowledged: null, failure: failure ?? 'not acknowledged before the round deadline' };
}
