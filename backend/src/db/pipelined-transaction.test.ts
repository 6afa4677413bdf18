import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AuditEventModel } from '../models/audit-event.model';
import { createTestContext, type TestContext } from '../../test/test-context';
import { connectionOf, findRow, insertRow, withConnection } from './direct-rows';
import { pipelinedTransaction } from './pipelined-transaction';

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(() => t.close());

const auditRow = (action: string) => ({ at: new Date(), actorId: null, action, entityType: 'test', entityId: null, beforeJson: null, afterJson: null, reason: null, ip: null });

describe('pipelined transaction', () => {
  it('when the work succeeds, then direct and model writes are committed together and after-commit hooks run', async () => {
    let hookRan = false;
    const id = await pipelinedTransaction(t.ctx.sequelize, async (transaction) => {
      transaction.afterCommit(() => {
        hookRan = true;
      });
      const direct = await insertRow(AuditEventModel, connectionOf(transaction), auditRow('test.pipelined-ok'));
      await AuditEventModel.create(auditRow('test.pipelined-ok-model'), { transaction });
      return direct;
    });
    expect(hookRan).toBe(true);
    expect((await AuditEventModel.findByPk(id))?.action).toBe('test.pipelined-ok');
    expect(await AuditEventModel.count({ where: { action: 'test.pipelined-ok-model' } })).toBe(1);
  });

  it('when the work throws after writing, then nothing it wrote is kept and the connection is given back', async () => {
    const action = `test.pipelined-rollback-${Date.now()}`;
    for (let i = 0; i < 8; i++) {
      await expect(
        pipelinedTransaction(t.ctx.sequelize, async (transaction) => {
          await insertRow(AuditEventModel, connectionOf(transaction), auditRow(action));
          await AuditEventModel.create(auditRow(action), { transaction });
          throw new Error('refused');
        }),
      ).rejects.toThrow('refused');
    }
    expect(await AuditEventModel.count({ where: { action } })).toBe(0);
    // The pool has 5 connections: eight rollbacks that kept theirs would have hung the next read.
    const seen = await pipelinedTransaction(t.ctx.sequelize, (transaction) => findRow(AuditEventModel, connectionOf(transaction), { action }));
    expect(seen).toBeNull();
  });

  it('when the first statement follows the unanswered START TRANSACTION, then it already runs inside the transaction (the key claim relies on it)', async () => {
    const inside = await pipelinedTransaction(t.ctx.sequelize, async (transaction) => (await connectionOf(transaction).query('SELECT @@in_transaction AS open')) as Array<{ open: number }>);
    const outside = await withConnection(t.ctx.sequelize, async (c) => (await c.query('SELECT @@in_transaction AS open')) as Array<{ open: number }>);
    expect([Number(inside[0]?.open), Number(outside[0]?.open)]).toEqual([1, 0]);
  });
});
