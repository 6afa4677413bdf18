import type { Express, RequestHandler } from 'express';

import type { Role } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { badRequest } from '../errors/app-error';
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

/** Path parameters that name a row by its numeric key. */
const NUMERIC_ID_PARAMS = ['id', 'readingId', 'timerId'] as const;
const CANONICAL_ID = /^[1-9][0-9]{0,15}$/;

/**
 * Ids in paths must be written as plain decimal digits. Number() would read "0x10", "1e3" or " 7"
 * as some other row's id, so such spellings are refused before a handler can coerce them.
 */
const requireCanonicalIds: RequestHandler = (req, _res, next) => {
  for (const name of NUMERIC_ID_PARAMS) {
    const value = (req.params as Record<string, string | undefined>)[name];
    if (value !== undefined && !CANONICAL_ID.test(value)) {
      const message = `“${value.slice(0, 40)}” is not a record id: ids are whole numbers written in digits, like 42.`;
      throw badRequest(message, { formErrors: [], fieldErrors: { [name]: [message] } });
    }
  }
  next();
};

/** Mounts every declared route; the table is kept on app.locals for the authorization tests. */
export function mountRoutes(app: Express, ctx: AppContext, specs: RouteSpec[]): void {
  for (const spec of specs) {
    const guard = spec.access === 'public' ? [] : [authenticate(ctx, spec.access)];
    const idCheck = spec.path.includes('/:') ? [requireCanonicalIds] : [];
    app[spec.method](spec.path, ...(spec.before ?? []), ...guard, ...idCheck, spec.handler);
  }
  app.locals.routeTable = specs;
}
