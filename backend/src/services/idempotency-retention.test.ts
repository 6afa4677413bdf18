import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { IdempotencyKeyModel } from '../models/idempotency-key.model';
import { createUser } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';
import { KEEP_IDEMPOTENCY_KEYS_DAYS, purgeOldIdempotencyKeys } from './idempotency-retention';

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(() => t.close());

const DAY = 24 * 60 * 60 * 1000;

describe('idempotency key retention', () => {
  it('when keys are older than the keep period, then they are deleted and younger ones stay', async () => {
    const now = new Date();
    const user = await createUser('operator');
    const key = (label: string, ageDays: number) => ({ userId: user.id, idempotencyKey: label, method: 'POST', path: '/api/x', requestHash: 'a'.repeat(64), statusCode: 200, responseBody: {}, createdAt: new Date(now.getTime() - ageDays * DAY) });
    await IdempotencyKeyModel.bulkCreate([key('a-day-too-old', KEEP_IDEMPOTENCY_KEYS_DAYS + 1), key('long-gone', 400), key('a-day-to-go', KEEP_IDEMPOTENCY_KEYS_DAYS - 1), key('today', 0)]);

    const deleted = await purgeOldIdempotencyKeys({ clock: { now: () => now } });

    expect(deleted).toBeGreaterThanOrEqual(2);
    const left = await IdempotencyKeyModel.findAll({ where: { userId: user.id }, order: [['createdAt', 'ASC']] });
    expect(left.map((k) => k.idempotencyKey)).toEqual(['a-day-to-go', 'today']);
  });
});
