import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DeviationModel } from '../../src/models/deviation.model';
import { RecipeVersionModel } from '../../src/models/recipe-version.model';
import { RunReadingModel } from '../../src/models/run-reading.model';
import { RunTimerModel } from '../../src/models/run-timer.model';
import { UserModel } from '../../src/models/user.model';
import type { RouteSpec } from '../../src/routes/route-table';
import { createUser, signInAs, TEST_PASSWORD } from '../fixtures';
import { createLot, post } from '../run-fixtures';
import { createTestContext, type TestContext } from '../test-context';
import { HOSTILE_IDS } from './hostile-input';
import { buildHostileWorld, type HostileWorld } from './hostile-world';
import { callerFor, declaredRoutes, paramNames } from './route-callers';
import { existingParams, validBody } from './write-route-bodies';
import { writeSnapshot } from './write-snapshot';

let t: TestContext;
let world: HostileWorld;
let snapshot: ReturnType<typeof writeSnapshot>;

beforeAll(async () => {
  t = await createTestContext({ SIGN_IN_LIMIT: '100000' });
  world = await buildHostileWorld(t);
  snapshot = writeSnapshot(t.ctx.sequelize, world);
}, 120_000);
afterAll(() => t.close());

const NUMERIC_PARAMS = new Set(['id', 'readingId', 'timerId']);
/** A well-formed id beyond any row the test database will hold. */
const MISSING_ID = '2147483000';

// Sign-out takes no id and ends the session; every other route with a numeric id is covered.
const idRoutes = declaredRoutes().filter((r) => paramNames(r.path).some((name) => NUMERIC_PARAMS.has(name)));

function urlWith(spec: RouteSpec, name: string, value: string): string {
  const existing = existingParams(world, spec.path);
  const path = paramNames(spec.path).reduce((p, param) => p.replace(`:${param}`, param === name ? value : (existing[param] ?? '')), spec.path);
  // The diff needs a version to compare with; every other GET reads its row from the path alone.
  return spec.path.endsWith('/diff') ? `${path}?against=${world.draftId}` : path;
}

async function call(spec: RouteSpec, url: string) {
  const caller = callerFor(world, spec);
  const body = spec.method === 'get' ? undefined : await validBody(world, spec.method, spec.path);
  const req = caller.agent[spec.method](url).set('X-CSRF-Token', caller.csrf);
  return body === undefined ? req : req.send(body as object);
}

const idCases = idRoutes.flatMap((spec) =>
  paramNames(spec.path)
    .filter((name) => NUMERIC_PARAMS.has(name))
    .map((name) => [`${spec.method.toUpperCase()} ${spec.path}`, name, spec] as const),
);

describe('ids in paths', () => {
  it('when the route table is read, then the routes with ids are found', () => {
    expect(idCases.length).toBeGreaterThan(40);
  });

  it.each(idCases)('when %s gets :%s spelled as something other than an id, then 400 names the id and nothing is written', async (_label, name, spec) => {
    const before = await snapshot();
    for (const spelling of HOSTILE_IDS) {
      const res = await call(spec, urlWith(spec, name, encodeURIComponent(spelling)));
      const where = `${spec.method} ${spec.path} :${name}=${JSON.stringify(spelling)} → ${res.status} ${JSON.stringify(res.body)}`;
      // "..", as a path segment, may be resolved before routing: then no route matches at all.
      expect(spelling === '..' ? [400, 404] : [400], where).toContain(res.status);
      expect(res.body.error.message, where).toMatch(/id/i);
    }
    expect(await snapshot()).toBe(before);
  });

  it.each(idCases)('when %s names a :%s no row has, then 404 and nothing is written', async (_label, name, spec) => {
    const before = await snapshot();
    const res = await call(spec, urlWith(spec, name, MISSING_ID));
    expect(res.status, `${spec.path} → ${JSON.stringify(res.body)}`).toBe(404);
    expect(res.body.error.code).toBe('NOT_FOUND');
    expect(await snapshot()).toBe(before);
  });
});

describe('rows of one run cannot be reached through another', () => {
  it('when a reading of one run is corrected through another run, then 404 and the reading is unchanged', async () => {
    const before = (await RunReadingModel.findByPk(world.readingId))?.toJSON();
    const res = await post(world.sessions.operator, `/api/runs/${world.spareRunId}/readings/${world.readingId}/correct`, { value: 5, reason: 'Trying it through another run.' });
    expect(res.status).toBe(404);
    expect((await RunReadingModel.findByPk(world.readingId))?.toJSON()).toEqual(before);
  });

  it('when a timer of one run is stopped through another run, then 404 and the timer keeps running', async () => {
    const res = await post(world.sessions.operator, `/api/runs/${world.spareRunId}/timers/${world.timerId}/stop`, {});
    expect(res.status).toBe(404);
    expect((await RunTimerModel.findByPk(world.timerId))?.stoppedAt).toBeNull();
  });

  it('when a problem names pieces of another run, then 422 and no deviation opens', async () => {
    const otherPieces = (await world.sessions.engineer.agent.get(`/api/runs/${world.runId}`)).body.pieces.map((p: { id: number }) => p.id) as number[];
    const before = await DeviationModel.count({ where: { runId: world.spareRunId } });
    const res = await post(world.sessions.operator, `/api/runs/${world.spareRunId}/problems`, { description: 'Pieces of the other run.', severity: 'minor', pieceIds: otherPieces });
    expect(res.status).toBe(422);
    expect(res.body.error.details.fieldErrors.pieceIds).toBeDefined();
    expect(await DeviationModel.count({ where: { runId: world.spareRunId } })).toBe(before);
  });

  it('when a lot the run did not plan is confirmed, then 422 names the lot', async () => {
    const stranger = await createLot('ink', world.records.inkId, { expiresOn: '2999-12-31' });
    const res = await post(world.sessions.operator, `/api/runs/${world.runId}/lot-confirmations`, { stepId: 'print-ag-1', lotId: stranger.id });
    expect(res.status).toBe(422);
    expect(res.body.error.details.fieldErrors.lotId).toBeDefined();
  });
});

describe('a person’s own things', () => {
  it('when a PIN is set with another person’s id in the body, then only the caller’s PIN changes', async () => {
    const { engineer } = world.sessions;
    const other = await UserModel.findByPk(world.pinUserId);
    const res = await engineer.agent.put('/api/auth/pin').set('X-CSRF-Token', engineer.csrf).send({ pin: '8642', password: TEST_PASSWORD, userId: world.pinUserId, id: world.pinUserId });
    expect(res.status).toBe(204);
    expect((await UserModel.findByPk(world.pinUserId))?.pinHash).toBe(other?.pinHash);
    expect((await UserModel.findByPk(engineer.user.id))?.pinHash).not.toBeNull();
  });

  it('when someone signs out naming another person, then only their own sessions end', async () => {
    const target = await UserModel.findByPk(world.targetUserId);
    // Someone of their own: signing out ends every session of the person, and the world's are shared.
    const extra = await signInAs(t.app, await createUser('engineer'));
    const res = await extra.agent.post('/api/auth/sign-out').set('X-CSRF-Token', extra.csrf).send({ userId: world.targetUserId });
    expect(res.status).toBe(204);
    expect((await UserModel.findByPk(world.targetUserId))?.tokenVersion).toBe(target?.tokenVersion);
  });

  it('when an admin tries to demote or deactivate themselves, then 409 and nothing changes', async () => {
    const { admin } = world.sessions;
    for (const change of [{ role: 'operator' }, { status: 'deactivated' }]) {
      const res = await admin.agent.patch(`/api/users/${admin.user.id}`).set('X-CSRF-Token', admin.csrf).send(change);
      expect(res.status).toBe(409);
    }
    expect(await UserModel.findByPk(admin.user.id)).toMatchObject({ role: 'admin', status: 'active' });
  });

  it('when a released version is saved over, then 409 and its content is unchanged', async () => {
    const { engineer } = world.sessions;
    const before = (await RecipeVersionModel.findByPk(world.releasedVersionId))?.contentHash;
    const res = await engineer.agent.put(`/api/recipe-versions/${world.releasedVersionId}`).set('X-CSRF-Token', engineer.csrf).send({ lockVersion: 1, changeNote: 'Sneaky edit.', steps: [] });
    expect(res.status).toBe(409);
    expect((await RecipeVersionModel.findByPk(world.releasedVersionId))?.contentHash).toBe(before);
  });
});
