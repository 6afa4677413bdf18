import type { Transaction } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DeviationModel } from '../models/deviation.model';
import { RecipeModel } from '../models/recipe.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunReadingModel } from '../models/run-reading.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunModel } from '../models/run.model';
import { UserModel } from '../models/user.model';
import { createTestContext, type TestContext } from '../../test/test-context';
import { DEMO_PEOPLE } from './demo-people';
import { seedDemoMaterials } from './seed-demo-materials';
import { seedDemoRecipes } from './seed-demo-recipes';
import { seedDemoRuns } from './seed-demo-runs';

// Seeded inside a transaction that is rolled back (fixed codes). The clock sits in a year no other
// test plans runs in, so this transaction's lock on that year's run counter blocks nobody.
let t: TestContext;
let transaction: Transaction;
let run: RunModel;
beforeAll(async () => {
  t = await createTestContext();
  t.ctx.clock = { now: () => new Date('2999-03-10T14:00:00Z') };
  transaction = await t.ctx.sequelize.transaction();
  for (const p of DEMO_PEOPLE) await UserModel.create({ email: p.email, name: p.name, role: p.role, status: 'active' }, { transaction });
  await seedDemoMaterials(t.ctx, transaction);
  await seedDemoRecipes(t.ctx, transaction);
  await seedDemoRuns(t.ctx, transaction);
  const recipe = await RecipeModel.findOne({ where: { code: 'TOUCH-4K' }, transaction });
  run = (await RunModel.findOne({ where: { recipeId: recipe?.id ?? 0 }, transaction })) as RunModel;
});
afterAll(async () => {
  await transaction.rollback();
  await t.close();
});

describe('demo run', () => {
  it('when seeded, then TOUCH-4K v1 runs as R-2999-0001 with eight pieces, five steps done and the inspection under way', async () => {
    expect(run).toMatchObject({ code: 'R-2999-0001', state: 'in-progress', quantity: 8 });
    expect(await RunPieceModel.count({ where: { runId: run.id }, transaction })).toBe(8);
    const steps = await RunStepRecordModel.findAll({ where: { runId: run.id }, order: [['id', 'ASC']], transaction });
    expect(steps.map((s) => `${s.stepId}:${s.state}`)).toEqual(['wipe-pet:done', 'print-keys:done', 'dry-keys:done', 'cure-keys:done', 'attach-tail:done', 'inspect-keys:in-progress']);
  });

  it('when seeded, then nine readings are kept and the one out of limits has its deviation', async () => {
    const readings = await RunReadingModel.findAll({ where: { runId: run.id }, transaction });
    expect(readings).toHaveLength(9);
    const high = readings.filter((r) => r.outOfLimits);
    expect(high.map((r) => [r.specId, r.value])).toEqual([['r-key-4', 12.6]]);
    const deviations = await DeviationModel.findAll({ where: { runId: run.id }, transaction });
    expect(deviations.map((d) => [d.rule, d.sourceType, d.sourceId])).toEqual([['reading-out-of-limits', 'reading', high[0]?.id]]);
    expect(deviations[0]?.title).toContain('R-2999-0001-03');
    const third = await RunPieceModel.findOne({ where: { runId: run.id, number: 3 }, transaction });
    expect(high[0]?.pieceId).toBe(third?.id);
  });
});
