import { UniqueConstraintError, type Transaction } from 'sequelize';

import type { AppContext } from '../app-context';
import { unprocessable } from '../errors/app-error';
import { IdempotencyKeyModel } from '../models/idempotency-key.model';
import type { UserModel } from '../models/user.model';
import { parseJsonColumn } from './catalogue-dto';

/** A write's Idempotency-Key, scoped to the person, and the fingerprint of the request it came with. */
export interface IdempotencyClaim {
  userId: number;
  key: string;
  method: string;
  path: string;
  /** SHA-256 of method, path and body: the same key with another request is refused. */
  requestHash: string;
}

/** Who writes, and the key the tablet's outbox sent with the write (null for a plain request). */
export interface TabletWrite {
  actor: UserModel;
  claim: IdempotencyClaim | null;
}

/** The answer of a write: sent as is, and stored under its key for a retry to replay. */
export interface WriteResult<T> {
  status: number;
  body: T;
  /** True when this answer was stored by an earlier request with the same key (nothing was done now). */
  isReplay: boolean;
}

/**
 * The answer stored under the claim's key, or null when the key is new. The same key with a
 * different request is refused (422): a client reusing keys by mistake must not get someone
 * else's answer, nor have its write silently dropped.
 */
export async function storedAnswer<T>(claim: IdempotencyClaim): Promise<WriteResult<T> | null> {
  const row = await IdempotencyKeyModel.findOne({ where: { userId: claim.userId, idempotencyKey: claim.key } });
  if (!row || row.statusCode === null) return null;
  if (row.requestHash !== claim.requestHash) {
    throw unprocessable(
      `The Idempotency-Key “${claim.key}” was already used for a different request (${row.method} ${row.path}), so this one was not done. Send each new write with a new key.`,
      { key: claim.key, usedFor: `${row.method} ${row.path}` },
    );
  }
  return { status: row.statusCode, body: parseJsonColumn<T>(row.responseBody, null as T), isReplay: true };
}

/**
 * Runs a write and stores its answer under its key in one transaction, so a crash can leave
 * neither a change without its key (a retry would do it twice) nor a key without its change.
 * A known key replays its stored answer without calling `work`. The key row is claimed first:
 * a twin request with the same key (the outbox retrying while the first is still running)
 * waits on that row, fails on the unique key once the first commits, and replays its answer.
 * A refused write (an error) rolls back with its key, so a corrected retry may use it again.
 */
export async function idempotentTransaction<T>(
  ctx: AppContext,
  claim: IdempotencyClaim | null,
  status: number,
  work: (transaction: Transaction) => Promise<T>,
): Promise<WriteResult<T>> {
  const earlier = claim ? await storedAnswer<T>(claim) : null;
  if (earlier) return earlier;
  try {
    return await ctx.sequelize.transaction(async (transaction) => {
      const keyRow = claim
        ? await IdempotencyKeyModel.create(
            { userId: claim.userId, idempotencyKey: claim.key, method: claim.method, path: claim.path, requestHash: claim.requestHash, statusCode: null, responseBody: null, createdAt: ctx.clock.now() },
            { transaction },
          )
        : null;
      // A JSON round trip, so the first answer is byte for byte what a replay will send.
      const body = JSON.parse(JSON.stringify(await work(transaction))) as T;
      await keyRow?.update({ statusCode: status, responseBody: body }, { transaction });
      return { status, body, isReplay: false };
    });
  } catch (err) {
    if (claim && err instanceof UniqueConstraintError) {
      const twin = await storedAnswer<T>(claim);
      if (twin) return twin;
    }
    throw err;
  }
}
