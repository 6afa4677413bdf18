import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { RecipeDetailSchema, RecipeListSchema } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createRecipe, uniqueCode, write } from '../../test/recipe-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let engineer2: SignedIn;
let operator: SignedIn;
let quality: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  [engineer, engineer2, operator, quality] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'engineer'), signedInUser(t.app, 'operator'), signedInUser(t.app, 'quality')]);
});
afterAll(() => t.close());

const writesBy = (who: SignedIn) => AuditEventModel.count({ where: { actorId: who.user.id } });

describe('/api/recipes', () => {
  it('when an engineer creates a recipe, then it is listed with an empty draft v1, readable, and both creations are audited', async () => {
    const code = uniqueCode('TOUCH');
    const res = await write(engineer, 'post', '/api/recipes', { code: code.toLowerCase(), name: 'Four-key touch strip', product: 'Touch strip', notes: 'PET' });
    expect(res.status).toBe(201);
    const detail = RecipeDetailSchema.parse(res.body);
    expect(detail).toMatchObject({ code, version: 1, archived: false, latestVersion: { number: 1, state: 'draft' }, releasedVersion: null });
    expect(detail.versions).toMatchObject([{ number: 1, state: 'draft', author: { id: engineer.user.id, name: engineer.user.name } }]);

    const list = RecipeListSchema.parse((await operator.agent.get('/api/recipes').query({ q: code })).body);
    expect(list.recipes.map((r) => r.id)).toEqual([detail.id]);
    expect((await quality.agent.get(`/api/recipes/${detail.id}`)).body).toEqual(res.body);
    const version = await RecipeVersionModel.findByPk(detail.versions[0]?.id);
    expect(version?.contentHash).toMatch(/^[0-9a-f]{64}$/);
    const actions = await AuditEventModel.findAll({ where: { actorId: engineer.user.id }, order: [['id', 'ASC']] });
    expect(actions.slice(-2).map((a) => [a.action, a.entityType])).toEqual([
      ['recipe.created', 'recipe'],
      ['recipe-version.created', 'recipe-version'],
    ]);
  });

  it('when the code is already taken, then 409 names it and nothing is written', async () => {
    const { code } = await createRecipe(engineer);
    const before = await writesBy(engineer2);
    const res = await write(engineer2, 'post', '/api/recipes', { code, name: 'Copy', product: 'Copy' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toContain(code);
    expect(await RecipeModel.count({ where: { code } })).toBe(1);
    expect(await writesBy(engineer2)).toBe(before);
  });

  it('when two engineers update the recipe from the same version, then the second gets 409 and the first one’s change stays', async () => {
    const { recipeId, code } = await createRecipe(engineer);
    const first = await write(engineer, 'put', `/api/recipes/${recipeId}`, { code, name: 'First name', product: 'Strip', version: 1 });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ name: 'First name', version: 2 });
    const second = await write(engineer2, 'put', `/api/recipes/${recipeId}`, { code, name: 'Second name', product: 'Strip', version: 1 });
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/Nothing was lost/);
    expect(second.body.error.details).toEqual({ currentVersion: 2 });
    expect((await RecipeModel.findByPk(recipeId))?.name).toBe('First name');
    const audit = await AuditEventModel.findOne({ where: { action: 'recipe.updated', entityId: String(recipeId) } });
    expect(audit?.beforeJson).toMatchObject({ name: `Recipe ${code}`, version: 1 });
    expect(audit?.afterJson).toMatchObject({ name: 'First name', version: 2 });
  });

  const badBodies: Array<[string, object]> = [
    ['no fields at all', {}],
    ['a number as the name', { code: 'AB-1', name: 42, product: 'x' }],
    ['a 10 000-character product', { code: 'AB-1', name: 'x', product: 'p'.repeat(10_000) }],
    ['SQL in the code', { code: "X'; DROP TABLE recipes;--", name: 'x', product: 'x' }],
    ['a code sent as the number NaN would become', { code: null, name: 'x', product: 'x' }],
    ['an array as the body', [1, 2]],
  ];
  it.each(badBodies)('when the body has %s, then 400 names the problem and nothing is written', async (_label, body) => {
    const before = await writesBy(engineer);
    const res = await write(engineer, 'post', '/api/recipes', body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.message.length).toBeGreaterThan(5);
    expect(await writesBy(engineer)).toBe(before);
  });

  it('when SQL metacharacters are in the name or the search, then they are kept and searched as plain text', async () => {
    const name = `Robert'); DROP TABLE recipes;-- 100%_ ${uniqueCode()}`;
    const res = await write(engineer, 'post', '/api/recipes', { code: uniqueCode(), name, product: 'Label' });
    expect(res.body.name).toBe(name);
    const found = await operator.agent.get('/api/recipes').query({ q: name });
    expect(found.body.recipes.map((r: { id: number }) => r.id)).toEqual([res.body.id]);
  });

  it('when an operator or quality tries to write, then 403 and nothing changes; both may read', async () => {
    const { recipeId, code } = await createRecipe(engineer);
    const before = await writesBy(operator);
    expect((await write(operator, 'post', '/api/recipes', { code: uniqueCode(), name: 'x', product: 'x' })).status).toBe(403);
    expect((await write(quality, 'put', `/api/recipes/${recipeId}`, { code, name: 'q', product: 'q', version: 1 })).status).toBe(403);
    expect((await write(operator, 'post', `/api/recipes/${recipeId}/versions`, {})).status).toBe(403);
    expect((await RecipeModel.findByPk(recipeId))?.version).toBe(1);
    expect(await writesBy(operator)).toBe(before);
    expect((await operator.agent.get(`/api/recipes/${recipeId}`)).status).toBe(200);
  });

  it('when the id is unknown, then 404; when it is not a whole number, then 400', async () => {
    expect((await engineer.agent.get('/api/recipes/2147483000')).status).toBe(404);
    expect((await write(engineer, 'put', '/api/recipes/2147483000', { code: 'AB-1', name: 'x', product: 'x', version: 1 })).status).toBe(404);
    expect((await engineer.agent.get('/api/recipes/abc')).status).toBe(400);
    expect((await engineer.agent.get('/api/recipes/1.5')).status).toBe(400);
  });
});
