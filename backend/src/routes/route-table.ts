import type { Express, RequestHandler } from 'express';

import type { Role } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { authenticate } from '../middleware/authenticate';

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** Who may call a route. There is no default: every route names its audience. */
export type Access = 'public' | 'signed-in' | readonly Role[];

export interface RouteSpec {
  method: HttpMethod;
  path: string;
  access: Access;
  handler: RequestHandler;
  /** Middleware that runs before authentication, e.g. a rate limiter or an upload parser. */
  before?: RequestHandler[];
}

export const route = (
  method: HttpMethod,
  path: string,
  access: Access,
  handler: RequestHandler,
  before: RequestHandler[] = [],
): RouteSpec => ({ method, path, access, handler, before });

/** Mounts every declared route; the table is kept on app.locals for the authorization tests. */
export function mountRoutes(app: Express, ctx: AppContext, specs: RouteSpec[]): void {
  for (const spec of specs) {
    const guard = spec.access === 'public' ? [] : [authenticate(ctx, spec.access)];
    app[spec.method](spec.path, ...(spec.before ?? []), ...guard, spec.handler);
  }
  app.locals.routeTable = specs;
}
