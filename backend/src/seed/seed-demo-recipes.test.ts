import type { Transaction } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DraftContentSchema } from '@tracewright/shared';

import { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import { SignatureModel } from '../models/signature.model';
import { UserModel } from '../models/user.model';
import { contentHashOf, versionContent } from '../services/recipe-dto';
import { loadReferences } from '../services/recipe-references';
import { evaluateContent } from '../services/recipe-version-view';
import { createTestContext, type TestContext } from '../../test/test-context';
import { DEMO_PEOPLE } from './demo-people';
import { seedDemoMaterials } from './seed-demo-materials';
import { seedDemoRecipes } from './seed-demo-recipes';

// The demo recipes use fixed codes, so they are seeded inside a transaction that is rolled back:
// the shared test database keeps none of them, and the suite can run again on the same database.
let t: TestContext;
let transaction: Transaction;
beforeAll(async () => {
  t = await createTestContext();
  transaction = await t.ctx.sequelize.transaction();
  for (const p of DEMO_PEOPLE) await UserModel.create({ email: p.email, name: p.name, role: p.role, status: 'active' }, { transaction });
  await seedDemoMaterials(t.ctx, transaction);
  await seedDemoRecipes(t.ctx, transaction);
});
afterAll(async () => {
  await transaction.rollback();
  await t.close();
});

const versionsOf = async (code: string) => {
  const recipe = await RecipeModel.findOne({ where: { code }, transaction });
  return RecipeVersionModel.findAll({ where: { recipeId: recipe?.id ?? 0 }, order: [['number', 'ASC']], transaction });
};

describe('demo recipes', () => {
  it('when seeded, then the three recipes stand where the demo tells its story', async () => {
    const states = async (code: string) => (await versionsOf(code)).map((v) => `${v.number}:${v.state}`);
    expect(await states('TOUCH-4K')).toEqual(['1:released', '2:draft']);
    expect(await states('LENS-HEAT')).toEqual(['1:in-review']);
    expect(await states('HUMID-LBL')).toEqual(['1:draft']);
  });

  it('when seeded, then TOUCH-4K v1 is signed by the demo quality person over the hash of its exact content', async () => {
    const [v1] = await versionsOf('TOUCH-4K');
    const signature = await SignatureModel.findOne({ where: { entityType: 'recipe-version', entityId: v1?.id ?? 0 }, transaction });
    const quality = DEMO_PEOPLE.find((p) => p.role === 'quality');
    expect(signature).toMatchObject({ printedName: quality?.name, meaning: 'approved for production', contentHash: v1?.contentHash });
    expect(contentHashOf(versionContent(v1 as RecipeVersionModel))).toBe(v1?.contentHash);
    expect(v1?.authorId).not.toBe(signature?.userId);
  });

  it('when seeded, then every version parses as draft content and none past draft has a blocked check', async () => {
    for (const code of ['TOUCH-4K', 'LENS-HEAT', 'HUMID-LBL']) {
      for (const version of await versionsOf(code)) {
        const content = DraftContentSchema.parse(versionContent(version));
        const { summary, timeline } = evaluateContent(content, await loadReferences(content, transaction));
        if (version.state !== 'draft') expect(summary.isBlocked, `${code} v${version.number}`).toBe(false);
        expect(timeline.totalMinutes).toBeGreaterThan(0);
      }
    }
  });

  it('when seeded, then the touch strip measures its traces against reading specs with trace length and width', async () => {
    const [v1] = await versionsOf('TOUCH-4K');
    const inspect = versionContent(v1 as RecipeVersionModel).steps.find((s) => s.kind === 'inspect');
    expect(inspect?.readingSpecs.filter((r) => r.traceLengthMm !== null && r.traceWidthMm !== null).length).toBeGreaterThan(0);
  });
});
