import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { ROLES, type Role } from '@tracewright/shared';

import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';
import type { RouteSpec } from './route-table';

let t: TestContext;
const sessions = {} as Record<Role, SignedIn>;

beforeAll(async () => {
  t = await createTestContext({ SIGN_IN_LIMIT: '1000', PIN_LIMIT: '1000' });
  for (const role of ROLES) sessions[role] = await signedInUser(t.app, role);
});
afterAll(() => t.close());

interface MountedRoute {
  method: string;
  path: string;
}

/** Every route Express actually serves, read from its router, not from our own table. */
function mountedRoutes(): MountedRoute[] {
  const stack = (t.app.router as unknown as { stack: Array<{ route?: { path: string; methods: Record<string, boolean> } }> }).stack;
  return stack.flatMap((layer) =>
    layer.route
      ? Object.keys(layer.route.methods).map((method) => ({ method, path: layer.route?.path ?? '' }))
      : [],
  ).filter((r) => r.path.startsWith('/api'));
}

const table = () => t.app.locals.routeTable as RouteSpec[];
const concretePath = (path: string) => path.replace(/:token/g, 'A'.repeat(43)).replace(/:[a-zA-Z]+/g, '999999');

describe('authorization matrix', () => {
  it('when Express serves an API route, then the route table declares who may call it', () => {
    const declared = new Set(table().map((r) => `${r.method} ${r.path}`));
    const undeclared = mountedRoutes().filter((r) => !declared.has(`${r.method} ${r.path}`));
    expect(undeclared).toEqual([]);
    expect(mountedRoutes().length).toBe(table().length);
    for (const spec of table()) {
      expect(spec.access === 'public' || spec.access === 'signed-in' || (Array.isArray(spec.access) && spec.access.length > 0)).toBe(true);
    }
  });

  it('when nobody is signed in, then every non-public route answers 401', async () => {
    for (const spec of table().filter((r) => r.access !== 'public')) {
      const res = await request(t.app)[spec.method](concretePath(spec.path)).send({});
      expect(res.status, `${spec.method} ${spec.path}`).toBe(401);
    }
  });

  it.each(ROLES)('when signed in as %s, then routes outside the role answer 403 and allowed ones do not', async (role) => {
    const session = sessions[role];
    for (const spec of table().filter((r) => r.access !== 'public' && !r.path.includes('sign-out'))) {
      const res = await session.agent[spec.method](concretePath(spec.path)).set('X-CSRF-Token', session.csrf).send({});
      const allowed = spec.access === 'signed-in' || (spec.access as readonly Role[]).includes(role);
      if (allowed) {
        expect([401, 403], `${role} ${spec.method} ${spec.path} -> ${res.status}`).not.toContain(res.status);
      } else {
        expect(res.status, `${role} ${spec.method} ${spec.path}`).toBe(403);
      }
      expect(res.status, `${role} ${spec.method} ${spec.path}`).toBeLessThan(500);
    }
  });
});
