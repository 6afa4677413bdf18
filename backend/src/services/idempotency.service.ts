import type { Connection } from 'mariadb';
import type { Transaction } from 'sequelize';

import type { AppContext } from '../app-context';
import { connectionOf, writing } from '../db/direct-rows';
import { pipelinedTransaction } from '../db/pipelined-transaction';
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
 * Inserts the key row unanswered, only inside a transaction: it travels right behind a START
 * TRANSACTION whose answer is not awaited (db/pipelined-transaction), and a claim committed on its
 * own would block its key for good. Resolves to the row's id.
 */
async function claimKey(connection: Connection, claim: IdempotencyClaim, at: Date): Promise<number> {
  const sql =
    'INSERT INTO idempotency_keys (user_id, idempotency_key, method, path, request_hash, status_code, response_body, created_at) ' +
    'SELECT ?, ?, ?, ?, ?, NULL, NULL, ? FROM DUAL WHERE @@in_transaction = 1';
  const result = (await writing(connection.query(sql, [claim.userId, claim.key, claim.method, claim.path, claim.requestHash, at]))) as { affectedRows: number; insertId: number | bigint };
  if (result.affectedRows !== 1) throw new Error('The Idempotency-Key was not claimed: no transaction was open.');
  return Number(result.insertId);
}

/** Sends a write now and waits for it only at the end, with the key's answer, before the commit. */
export type DeferWrite = (write: Promise<unknown>) => void;

/**
 * Runs a write and stores its answer under its key in one transaction, so a crash can leave
 * neither a change without its key (a retry would do it twice) nor a key without its change.
 * The key row is claimed first, in the same round trip as the write's first reads: a twin sent
 * while the first is still running waits on it, fails on its unique index once the first commits,
 * and replays the first's answer. A retry of a write that committed long ago fails the same way.
 * A refused write rolls back with its key, so a corrected retry may use it again. The answer is
 * stored with the write's deferred changes, in one round trip, and then the transaction commits.
 */
export async function idempotentTransaction<T>(
  ctx: AppContext,
  claim: IdempotencyClaim | null,
  status: number,
  work: (transaction: Transaction, defer: DeferWrite) => Promise<T>,
): Promise<WriteResult<T>> {
  try {
    return await pipelinedTransaction(ctx.sequelize, async (transaction) => {
      const connection = connectionOf(transaction);
      const pending: Array<Promise<unknown>> = [];
      const keep = (write: Promise<unknown>) => {
        // Awaited below; until then an early failure must not count as unhandled.
        write.catch(() => undefined);
        pending.push(write);
      };
      const keyRow = claim ? claimKey(connection, claim, ctx.clock.now()) : null;
      keyRow?.catch(() => undefined);
      // A JSON round trip, so the first answer is byte for byte what a replay will send.
      const body = JSON.parse(JSON.stringify(await work(transaction, keep))) as T;
      if (keyRow) keep(connection.query('UPDATE idempotency_keys SET status_code = ?, response_body = ? WHERE id = ?', [status, JSON.stringify(body), await keyRow]));
      await Promise.all(pending);
      return { status, body, isReplay: false };
    });
  } catch (err) {
    const earlier = claim ? await storedAnswer<T>(claim) : null;
    if (earlier) return earlier;
    throw err;
  }
}
