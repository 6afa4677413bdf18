import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { QualityDashboardSchema, QualityWaitingSchema, type QualityDashboard, type QualityWaiting } from '@tracewright/shared';

import { signedInUser, type SignedIn } from '../../test/fixtures';
import { completeRun, disposition, freshRun, reportProblem } from '../../test/quality-fixtures';
import { createRecipe, passingContent, createProcessRecords, saveDraft, write } from '../../test/recipe-fixtures';
import { createTestContext, TestClock, type TestContext } from '../../test/test-context';
import { getQualityWaiting } from '../services/quality-dashboard.service';

let t: TestContext;
let clock: TestClock;
let engineer: SignedIn;
let quality: SignedIn;
let operator: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  clock = new TestClock();
  t.ctx.clock = clock;
  [engineer, quality, operator] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'operator')]);
});
afterAll(() => t.close());

const DAY = 86_400_000;
const dashboard = async (who: SignedIn): Promise<QualityDashboard> => {
  const res = await who.agent.get('/api/quality/dashboard');
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return QualityDashboardSchema.parse(res.body);
};

const waiting = async (who: SignedIn): Promise<QualityWaiting> => {
  const res = await who.agent.get('/api/quality/waiting');
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return QualityWaitingSchema.parse(res.body);
};

describe('quality dashboard', () => {
  it('when critical deviations are raised, one of them ten days ago, then the open counts by severity and age grow with them', async () => {
    // The counts are lab-wide and other test files run alongside: only critical and week-old
    // deviations are compared, which no other test closes.
    const before = await dashboard(quality);
    const run = await freshRun(engineer, 1);
    clock.advance(-10 * DAY);
    await reportProblem(operator, run.id, { severity: 'critical', description: 'Raised ten days ago.' });
    clock.advance(10 * DAY);
    await reportProblem(operator, run.id, { severity: 'critical', description: 'Raised today.' });
    const after = await dashboard(engineer);
    expect((after.openBySeverity.critical ?? 0) - (before.openBySeverity.critical ?? 0)).toBeGreaterThanOrEqual(2);
    expect(after.openByAge.older).toBeGreaterThan(before.openByAge.older);
  });

  it('when a run completes with an undecided deviation, then it waits for sign-off with that count, which drops once dispositioned', async () => {
    const run = await freshRun(engineer, 1);
    const deviationId = await reportProblem(operator, run.id);
    await completeRun(operator, run.id);
    const waiting = (await dashboard(quality)).runsAwaitingSignOff.find((r) => r.id === run.id);
    expect(waiting).toMatchObject({ code: run.code, recipeCode: run.recipeCode, openDeviations: 1, completedAt: expect.any(String) });
    expect((await disposition(quality, deviationId, {})).status).toBe(200);
    expect((await dashboard(quality)).runsAwaitingSignOff.find((r) => r.id === run.id)?.openDeviations).toBe(0);
  });

  it('when a version is submitted for review, then the dashboard lists it', async () => {
    const records = await createProcessRecords();
    const { recipeId, draftId, code } = await createRecipe(engineer);
    await saveDraft(engineer, draftId, passingContent(records));
    expect((await write(engineer, 'post', `/api/recipe-versions/${draftId}/submit`)).status).toBe(200);
    expect((await dashboard(quality)).versionsAwaitingReview).toContainEqual(expect.objectContaining({ id: draftId, recipeId, recipeCode: code, number: 1 }));
  });

  it('when an operator asks for the dashboard or its counts, then 403', async () => {
    expect((await operator.agent.get('/api/quality/dashboard')).status).toBe(403);
    expect((await operator.agent.get('/api/quality/waiting')).status).toBe(403);
  });

  it('when a run completes, a version goes to review and a deviation closes, then each count moves by exactly one', async () => {
    const run = await freshRun(engineer, 1);
    const deviationId = await reportProblem(operator, run.id);
    const { draftId } = await createRecipe(engineer);
    await waiting(quality); // the route answers 200 with the counts' schema
    // Inside one transaction the counts see a snapshot plus its own changes, so other test files'
    // writes cannot move them; it is rolled back, leaving the lab as it was.
    const transaction = await t.ctx.sequelize.transaction();
    try {
      const before = await getQualityWaiting(t.ctx, transaction);
      const change = (sql: string, id: number) => t.ctx.sequelize.query(sql, { replacements: [id], transaction });
      await change("UPDATE runs SET state = 'completed' WHERE id = ?", run.id);
      await change("UPDATE recipe_versions SET state = 'in-review' WHERE id = ?", draftId);
      await change("UPDATE deviations SET state = 'closed' WHERE id = ?", deviationId);
      expect(await getQualityWaiting(t.ctx, transaction)).toEqual({
        runsAwaitingSignOff: before.runsAwaitingSignOff + 1,
        versionsAwaitingReview: before.versionsAwaitingReview + 1,
        deviationsNotClosed: before.deviationsNotClosed - 1,
      });
    } finally {
      await transaction.rollback();
    }
  });
});
