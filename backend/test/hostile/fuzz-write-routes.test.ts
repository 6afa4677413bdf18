import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { LabSettingsModel } from '../../src/models/lab-settings.model';
import { forgetLabSettings } from '../../src/services/settings.service';
import type { RouteSpec } from '../../src/routes/route-table';
import { TEST_PASSWORD, type SignedIn } from '../fixtures';
import { createTestContext, type TestContext } from '../test-context';
import { hostileBody, hostileId, hostileIdempotencyKey, hostileQuery, type BodyCase } from './hostile-input';
import { buildHostileWorld, type HostileWorld } from './hostile-world';
import { callerFor, declaredRoutes, paramNames } from './route-callers';
import { existingParams, validBody } from './write-route-bodies';
import { writeSnapshot } from './write-snapshot';

// FUZZ_RUNS=1000 for the long run; FUZZ_SEED replays a failure (route number i uses seed + i).
const RUNS = Number(process.env.FUZZ_RUNS ?? 100);
const SEED = process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : Math.floor(Math.random() * 2 ** 31);

/**
 * Routes are fuzzed side by side, each holding one world of its own while it runs: a world's
 * snapshot covers only its own rows, so one route's valid writes never look like another's leak.
 */
const WORLDS = 3;

interface Lane {
  world: HostileWorld;
  snapshot: ReturnType<typeof writeSnapshot>;
}

let t: TestContext;
const idle: Lane[] = [];
const waiting: Array<(lane: Lane) => void> = [];

async function withLane<T>(work: (lane: Lane) => Promise<T>): Promise<T> {
  const lane = idle.pop() ?? (await new Promise<Lane>((resolve) => waiting.push(resolve)));
  try {
    return await work(lane);
  } finally {
    const next = waiting.shift();
    if (next) next(lane);
    else idle.push(lane);
  }
}

beforeAll(async () => {
  // Limits high enough that the fuzzer reaches validation, not only the brakes (they are tested elsewhere).
  t = await createTestContext({ SIGN_IN_LIMIT: '1000000', PIN_LIMIT: '1000000', DB_POOL_MAX: '10' });
  for (let i = 0; i < WORLDS; i += 1) {
    const world = await buildHostileWorld(t);
    idle.push({ world, snapshot: writeSnapshot(t.ctx.sequelize, world) });
  }
  console.log(`fuzz-write-routes: FUZZ_SEED=${SEED} FUZZ_RUNS=${RUNS} (route number i uses seed ${SEED} + i)`);
}, 180_000);
afterAll(() => t.close());

function pathArbitrary(world: HostileWorld, path: string): fc.Arbitrary<string> {
  const existing = existingParams(world, path);
  const names = paramNames(path);
  const values = names.map((name) => fc.oneof({ weight: 3, arbitrary: fc.constant(existing[name] ?? '1') }, { weight: 1, arbitrary: hostileId() }));
  return fc.tuple(...values).map((chosen) => names.reduce((p, name, i) => p.replace(`:${name}`, chosen[i] ?? ''), path));
}

interface FuzzCase {
  url: string;
  body: BodyCase;
  idempotencyKey: string | null;
}

async function send(spec: RouteSpec, caller: SignedIn, c: FuzzCase) {
  let req = caller.agent[spec.method](c.url).set('X-CSRF-Token', caller.csrf).set('Content-Type', c.body.contentType);
  if (c.idempotencyKey !== null) req = req.set('Idempotency-Key', c.idempotencyKey);
  return req.send(c.body.text);
}

async function fuzzRoute(spec: RouteSpec, seed: number, { world, snapshot }: Lane) {
  const caller = callerFor(world, spec);
  const valid = await validBody(world, spec.method, spec.path);
  const isSettings = spec.path === '/api/settings';
  const settings = await LabSettingsModel.findOne();
  const cases = fc.record({
    url: fc.tuple(pathArbitrary(world, spec.path), hostileQuery()).map(([p, q]) => `${p}${q}`),
    body: hostileBody(valid),
    idempotencyKey: hostileIdempotencyKey(),
  });
  // One snapshot a case: compared with the last one after a 4xx, taken afresh after a 2xx.
  let baseline = await snapshot({ withLabSettings: isSettings });
  await fc.assert(
    fc.asyncProperty(cases, async (c) => {
      const res = await send(spec, caller, c);
      const where = `${spec.method.toUpperCase()} ${c.url.slice(0, 200)} → ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`;
      expect(res.status, where).toBeLessThan(500);
      if (res.status >= 400) {
        expect(typeof res.body?.error?.message === 'string' && res.body.error.message.length > 0, `a 4xx names its reason: ${where}`).toBe(true);
        expect(await snapshot({ withLabSettings: isSettings }), `nothing written on a 4xx: ${where}`).toBe(baseline);
      } else {
        // Other files read the lab's settings: a valid change the fuzzer made is put back at once.
        if (isSettings && settings) {
          await LabSettingsModel.update(settings.get(), { where: { id: settings.id } });
          forgetLabSettings();
        }
        baseline = await snapshot({ withLabSettings: isSettings });
      }
    }),
    // No shrinking: the baseline above holds only for the run that failed.
    { numRuns: RUNS, seed, endOnFailure: true },
  );
}

describe.concurrent('fuzzing every write route', () => {
  // Sign-out always succeeds and ends the session the rest of the run depends on.
  const routes = declaredRoutes().filter((r) => r.method !== 'get' && r.path !== '/api/auth/sign-out');

  it('when the route table is read, then there are write routes to fuzz', () => {
    expect(routes.length).toBeGreaterThan(40);
  });

  it.each(routes.map((spec, index) => [`${spec.method.toUpperCase()} ${spec.path}`, spec, index] as const))(
    'when %s gets hostile ids, bodies and query strings, then it never answers 5xx and a 4xx writes nothing',
    (_label, spec, index) => withLane((lane) => fuzzRoute(spec, SEED + index, lane)),
    Math.max(120_000, RUNS * 1_000),
  );
});

describe('the fuzzer itself', () => {
  it('when the snapshot is taken twice with no request between, then it is the same; after a write, it differs', async () => {
    await withLane(async ({ world, snapshot }) => {
      const first = await snapshot();
      expect(await snapshot()).toBe(first);
      const { quality } = world.sessions;
      const res = await quality.agent.put('/api/auth/pin').set('X-CSRF-Token', quality.csrf).send({ pin: '97531', password: TEST_PASSWORD });
      expect(res.status, JSON.stringify(res.body)).toBe(204);
      expect(await snapshot()).not.toBe(first);
    });
  });
});
