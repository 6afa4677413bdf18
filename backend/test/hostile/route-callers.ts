import type { Role } from '@tracewright/shared';

import type { AppContext } from '../../src/app-context';
import { createApp } from '../../src/app';
import { loadEnv } from '../../src/config/env';
import type { RouteSpec } from '../../src/routes/route-table';
import type { SignedIn } from '../fixtures';
import type { HostileWorld } from './hostile-world';

/** Who calls each route: the first role in this order that the route admits. */
const ROLE_PREFERENCE: readonly Role[] = ['operator', 'engineer', 'quality', 'admin'];

/**
 * The app's route table, read before any test runs (so tests can be generated from it) rather
 * than from a list of our own: a new route is covered without a change here. Building the app
 * connects to nothing, so settings alone are enough.
 */
export function declaredRoutes(): RouteSpec[] {
  const env = loadEnv({ NODE_ENV: 'test', DB_PASSWORD: 'unused', JWT_SECRET: 'x'.repeat(32) });
  return createApp({ env } as AppContext).locals.routeTable as RouteSpec[];
}

/** A person of the world whom the route admits; the trusted-device visitor for public routes. */
export function callerFor(world: HostileWorld, spec: RouteSpec): SignedIn {
  if (spec.access === 'public') return world.visitor;
  const roles = spec.access === 'signed-in' ? ROLE_PREFERENCE : spec.access;
  const role = ROLE_PREFERENCE.find((r) => roles.includes(r));
  if (!role) throw new Error(`no role may call ${spec.path}`);
  return world.sessions[role];
}

export const paramNames = (path: string) => [...path.matchAll(/:([a-zA-Z]+)/g)].map((m) => m[1] ?? '');
