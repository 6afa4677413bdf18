import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UniqueConstraintError } from 'sequelize';

import { AuditEventModel } from '../models/audit-event.model';
import { IdempotencyKeyModel } from '../models/idempotency-key.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunModel } from '../models/run.model';
import { UserModel } from '../models/user.model';
import { createUser, signedInUser } from '../../test/fixtures';
import { createRunRecords, planRun, releasedVersion, runnableContent } from '../../test/run-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';
import { findPlainRows, findRow, findRows, insertRow, updateRow, withConnection } from './direct-rows';

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(() => t.close());

const direct = <T>(work: Parameters<typeof withConnection<T>>[1]) => withConnection(t.ctx.sequelize, work);

describe('direct rows', () => {
  it('when a row is read directly, then its values equal what Sequelize reads (dates, booleans, JSON, big ids, nulls)', async () => {
    const engineer = await signedInUser(t.app, 'engineer');
    const { versionId } = await releasedVersion(runnableContent(await createRunRecords()));
    const run = await planRun(engineer, { versionId, quantity: 1 });
    await RunStepRecordModel.update({ hasDeviceTime: true, startedAt: new Date('2026-12-02T08:09:10.123Z') }, { where: { runId: run.id, stepId: 'plasma-1' } });
    const audit = await AuditEventModel.create({ at: new Date(), actorId: null, action: 'test.direct', entityType: 'test', entityId: null, beforeJson: { a: [1, 'two'] }, afterJson: null, reason: null, ip: null });

    const pairs: Array<[unknown, unknown]> = [
      [await RunModel.findByPk(run.id), await direct((c) => findRow(RunModel, c, { id: run.id }))],
      [await RunStepRecordModel.findAll({ where: { runId: run.id }, order: [['id', 'ASC']] }), await direct((c) => findRows(RunStepRecordModel, c, { runId: run.id }, { orderBy: 'id' }))],
      [await AuditEventModel.findByPk(audit.id), await direct((c) => findRow(AuditEventModel, c, { id: audit.id }))],
      [await UserModel.findByPk(engineer.user.id), await direct((c) => findRow(UserModel, c, { id: engineer.user.id }))],
    ];
    for (const [bySequelize, byDirect] of pairs) {
      const values = (x: unknown) => (Array.isArray(x) ? x.map((m) => m.get({ plain: true })) : (x as RunModel).get({ plain: true }));
      expect(values(byDirect)).toStrictEqual(values(bySequelize));
    }
    const plain = await direct((c) => findPlainRows(RunStepRecordModel, c, { runId: run.id }));
    expect(plain.sort((a, b) => a.id - b.id)).toStrictEqual((pairs[1]?.[0] as RunStepRecordModel[]).map((m) => m.get({ plain: true })));
    const records = await direct((c) => findRows(RunStepRecordModel, c, { runId: run.id, hasDeviceTime: true }));
    expect(records.map((r) => [r.stepId, r.hasDeviceTime, r.startedAt?.toISOString()])).toEqual([['plasma-1', true, '2026-12-02T08:09:10.123Z']]);
    expect(await direct((c) => findRows(RunStepRecordModel, c, { runId: run.id, completedAt: null }))).toHaveLength(5);
  });

  it('when a row is inserted and updated directly, then Sequelize reads back the same values, timestamps filled', async () => {
    const user = await createUser('operator');
    const before = Date.now();
    const id = await direct((c) =>
      insertRow(IdempotencyKeyModel, c, { userId: user.id, idempotencyKey: 'direct-1', method: 'POST', path: '/api/x', requestHash: 'f'.repeat(64), statusCode: 201, responseBody: { ok: true, list: [1, 2] }, createdAt: new Date('2026-12-02T10:00:00Z') }),
    );
    const again = direct((c) =>
      insertRow(IdempotencyKeyModel, c, { userId: user.id, idempotencyKey: 'direct-1', method: 'POST', path: '/api/y', requestHash: 'e'.repeat(64), statusCode: null, responseBody: null, createdAt: new Date() }),
    );
    // The same error Sequelize throws, so the error handler and callers treat a duplicate alike.
    await expect(again).rejects.toBeInstanceOf(UniqueConstraintError);
    const stored = await IdempotencyKeyModel.findByPk(id);
    expect(stored?.get({ plain: true })).toMatchObject({ userId: user.id, idempotencyKey: 'direct-1', statusCode: 201, responseBody: { ok: true, list: [1, 2] } });
    expect(stored?.createdAt.toISOString()).toBe('2026-12-02T10:00:00.000Z');

    const row = await UserModel.findByPk(user.id);
    if (!row) throw new Error('user vanished');
    const updated = await direct((c) => updateRow(row, c, { name: 'Renamed directly' }));
    expect(updated.name).toBe('Renamed directly');
    const reread = await UserModel.findByPk(user.id);
    expect(reread?.name).toBe('Renamed directly');
    expect(reread?.updatedAt.getTime()).toBeGreaterThanOrEqual(before - 1000);
  });

  it('when a condition names no column of the table, then it throws instead of reading everything', async () => {
    await expect(direct((c) => findRows(RunModel, c, { nonsense: 1 } as never))).rejects.toThrow(/no attribute “nonsense”/);
    await expect(direct((c) => findRows(RunModel, c, {}))).rejects.toThrow(/needs a condition/);
  });
});
