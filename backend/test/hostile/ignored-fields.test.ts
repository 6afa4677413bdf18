import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DeviationModel } from '../../src/models/deviation.model';
import { InkModel } from '../../src/models/ink.model';
import { RecipeVersionModel } from '../../src/models/recipe-version.model';
import { RecipeModel } from '../../src/models/recipe.model';
import { RunModel } from '../../src/models/run.model';
import { UserModel } from '../../src/models/user.model';
import { createUser, signInAs, TEST_PASSWORD, type SignedIn } from '../fixtures';
import { uniqueCode } from '../recipe-fixtures';
import { post } from '../run-fixtures';
import { createTestContext, uniqueEmail, type TestContext } from '../test-context';
import { buildHostileWorld, type HostileWorld } from './hostile-world';

// Fields a client has no say in, sent anyway: the stored row must take none of them.

let t: TestContext;
let world: HostileWorld;
beforeAll(async () => {
  t = await createTestContext();
  world = await buildHostileWorld(t);
}, 120_000);
afterAll(() => t.close());

const send = (who: SignedIn, method: 'post' | 'put' | 'patch', url: string, body: object) => who.agent[method](url).set('X-CSRF-Token', who.csrf).send(body);
const someoneElse = () => world.targetUserId;

describe('privileged fields in write bodies', () => {
  it('when an invitation carries status, hashes, token version and an id, then the person is only invited', async () => {
    const email = uniqueEmail('invitee');
    const res = await send(world.sessions.admin, 'post', '/api/users', {
      email, name: 'New person', role: 'operator', status: 'active', passwordHash: 'known-hash', pinHash: 'known-pin', tokenVersion: 99, id: 1,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const row = await UserModel.findOne({ where: { email } });
    expect(row).toMatchObject({ status: 'invited', tokenVersion: 1, role: 'operator' });
    expect(row?.id).not.toBe(1);
    expect(row?.passwordHash).not.toBe('known-hash');
    expect(row?.pinHash).toBeNull();
  });

  it('when a person is renamed with e-mail, hashes and token version in the body, then only the name changes', async () => {
    const before = await UserModel.findByPk(world.targetUserId);
    const res = await send(world.sessions.admin, 'patch', `/api/users/${world.targetUserId}`, {
      name: 'Renamed person', email: 'taken-over@elsewhere.example', passwordHash: 'known-hash', pinHash: 'known-pin', tokenVersion: 0,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const after = await UserModel.findByPk(world.targetUserId);
    expect(after).toMatchObject({ name: 'Renamed person', email: before?.email, passwordHash: before?.passwordHash, pinHash: before?.pinHash, tokenVersion: before?.tokenVersion });
  });

  it('when someone signs in claiming a role, then the session carries their own role', async () => {
    const operator = await createUser('operator');
    const session = await signInAs(t.app, operator);
    const claimed = await session.agent.post('/api/auth/sign-in').send({ email: operator.email, password: TEST_PASSWORD, role: 'admin', id: 1 });
    expect(claimed.status).toBe(200);
    expect(claimed.body.user).toMatchObject({ id: operator.id, role: 'operator' });
    expect((await session.agent.get('/api/users')).status).toBe(403);
  });

  it('when a recipe is created naming another author, an id, a version and a prototype, then the caller is its author', async () => {
    const code = uniqueCode('MA');
    const body = JSON.parse(`{"__proto__": {"createdBy": ${someoneElse()}}, "code": "${code}", "name": "Mass assignment", "product": "Strip", "createdBy": ${someoneElse()}, "id": 1, "version": 40, "archived": true}`) as object;
    const res = await send(world.sessions.engineer, 'post', '/api/recipes', body);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(await RecipeModel.findByPk(res.body.id)).toMatchObject({ code, createdBy: world.sessions.engineer.user.id, version: 1, archived: false });
    expect(res.body.id).not.toBe(1);
    expect(({} as Record<string, unknown>).createdBy).toBeUndefined();
  });

  it('when a draft is saved claiming to be released by someone else, then it stays a draft by its author', async () => {
    const before = await RecipeVersionModel.findByPk(world.draftId);
    const current = await world.sessions.engineer.agent.get(`/api/recipe-versions/${world.draftId}`);
    const res = await send(world.sessions.engineer, 'put', `/api/recipe-versions/${world.draftId}`, {
      ...current.body.content, lockVersion: current.body.lockVersion, state: 'released', authorId: someoneElse(), releasedBy: someoneElse(), number: 9, recipeId: world.releasedRecipeId, contentHash: 'f'.repeat(64),
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const after = await RecipeVersionModel.findByPk(world.draftId);
    expect(after).toMatchObject({ state: 'draft', authorId: before?.authorId, releasedBy: null, number: before?.number, recipeId: before?.recipeId });
    expect(after?.contentHash).not.toBe('f'.repeat(64));
  });

  it('when a run is planned with a state, a code and another planner, then it is planned by the caller', async () => {
    const res = await send(world.sessions.engineer, 'post', '/api/runs', {
      versionId: world.releasedVersionId, quantity: 1, state: 'completed', code: 'R-0000-0001', createdBy: someoneElse(), recipeId: world.recipeId,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const run = await RunModel.findByPk(res.body.id);
    expect(run).toMatchObject({ state: 'planned', createdBy: world.sessions.engineer.user.id, recipeId: world.releasedRecipeId });
    expect(run?.code).not.toBe('R-0000-0001');
  });

  it('when a problem is reported as closed, assigned and raised by someone else, then it opens as the caller’s', async () => {
    const res = await post(world.sessions.operator, `/api/runs/${world.runId}/problems`, {
      description: 'Smudge on piece two.', severity: 'minor', state: 'closed', createdBy: someoneElse(), assigneeId: someoneElse(), rule: 'expired-lot', closedBy: someoneElse(),
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(await DeviationModel.findByPk(res.body.deviation.id)).toMatchObject({
      state: 'open', createdBy: world.sessions.operator.user.id, assigneeId: null, rule: 'reported', closedBy: null,
    });
  });

  it('when an ink is created with an id, a version and archived, then it is a new, live first version', async () => {
    const view = (await world.sessions.engineer.agent.get(`/api/inks/${world.records.inkId}`)).body as Record<string, unknown>;
    const res = await send(world.sessions.engineer, 'post', '/api/inks', { ...view, name: `Ink ${uniqueCode()}`, id: world.records.inkId, version: 12, archived: true });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.id).not.toBe(world.records.inkId);
    expect(await InkModel.findByPk(res.body.id)).toMatchObject({ version: 1, archived: false });
  });
});
