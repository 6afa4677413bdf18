import { Transaction, type Sequelize } from 'sequelize';

import { connectionOf } from './direct-rows';

/**
 * A Sequelize transaction whose START TRANSACTION is sent but not waited for: the connection runs
 * commands in order, so the write's first statements follow it in the same round trip instead of
 * the next one. Its answer is awaited through `begun` before anything is changed, and before the
 * commit, so a transaction that failed to start never writes outside a transaction unnoticed.
 */
class PipelinedTransaction extends Transaction {
  started: Promise<unknown> = Promise.resolve();

  async begin(): Promise<void> {
    const started = connectionOf(this).query('START TRANSACTION');
    // Awaited later (begun, commit); this only keeps an early failure from counting as unhandled.
    started.catch(() => undefined);
    this.started = started;
  }

  override async commit(): Promise<void> {
    await this.started;
    return super.commit();
  }
}

/** Resolves once the transaction's START TRANSACTION has been answered (at once for any other transaction). */
export function begun(transaction: Transaction): Promise<unknown> {
  return transaction instanceof PipelinedTransaction ? transaction.started : Promise.resolve();
}

/**
 * Like `sequelize.transaction(work)`: commits when `work` resolves, rolls back when it throws.
 * The transaction works with models too (`{ transaction }`), on the same connection.
 */
export async function pipelinedTransaction<T>(sequelize: Sequelize, work: (transaction: Transaction) => Promise<T>): Promise<T> {
  const transaction = new PipelinedTransaction(sequelize, {});
  // Not in the typings: the same step sequelize.transaction() takes (get a connection, then begin).
  await (transaction as unknown as { prepareEnvironment(useCls: boolean): Promise<void> }).prepareEnvironment(false);
  let result: T;
  try {
    result = await work(transaction);
  } catch (err) {
    await transaction.rollback().catch(() => undefined);
    throw err;
  }
  await transaction.commit();
  return result;
}
