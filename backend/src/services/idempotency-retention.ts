import { Op } from 'sequelize';

import type { AppContext } from '../app-context';
import { IdempotencyKeyModel } from '../models/idempotency-key.model';

/**
 * How long a write's Idempotency-Key and answer are kept. A tablet retries what it sent until it
 * gets an answer, which takes minutes, or days for a tablet left off the network; a month covers
 * that with room (common practice, no source). After that, a key is only a row that grows the table:
 * one for every tablet write.
 */
export const KEEP_IDEMPOTENCY_KEYS_DAYS = 30;
const DAY_MS = 24 * 60 * 60 * 1000;
/** Rows deleted per statement, so the purge never holds many locks at once (created_at is indexed). */
const BATCH = 5_000;

/** Deletes keys older than the keep period, a batch at a time; returns how many went. */
export async function purgeOldIdempotencyKeys(ctx: Pick<AppContext, 'clock'>, keepDays = KEEP_IDEMPOTENCY_KEYS_DAYS): Promise<number> {
  const before = new Date(ctx.clock.now().getTime() - keepDays * DAY_MS);
  let total = 0;
  for (;;) {
    const deleted = await IdempotencyKeyModel.destroy({ where: { createdAt: { [Op.lt]: before } }, limit: BATCH });
    total += deleted;
    if (deleted < BATCH) return total;
  }
}

/** Purges now and then every `everyMs` while the server runs; failures are logged and tried again next time. */
export function startIdempotencyKeyPurge(ctx: Pick<AppContext, 'clock' | 'logger'>, everyMs = 6 * 60 * 60 * 1000): () => void {
  const purge = () =>
    purgeOldIdempotencyKeys(ctx).then(
      (deleted) => {
        if (deleted > 0) ctx.logger.info({ deleted, keepDays: KEEP_IDEMPOTENCY_KEYS_DAYS }, 'old idempotency keys purged');
      },
      (err: unknown) => ctx.logger.warn({ err: { message: (err as Error).message } }, 'idempotency keys not purged; trying again later'),
    );
  void purge();
  const timer = setInterval(() => void purge(), everyMs);
  timer.unref();
  return () => clearInterval(timer);
}
