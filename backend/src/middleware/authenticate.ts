import type { NextFunction, Request, Response } from 'express';

import type { Role } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { findRow, withConnection } from '../db/direct-rows';
import { AppError, forbidden, unauthenticated } from '../errors/app-error';
import { verifySession } from '../lib/session-token';
import { UserModel } from '../models/user.model';
import { SESSION_COOKIE } from './session-cookies';

declare module 'express-serve-static-core' {
  interface Request {
    user?: UserModel;
    /** The CSRF token bound into the caller's session. */
    csrfToken?: string;
  }
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Who: a valid token whose version matches the person's current one, of an active account.
 * The user row is read on every request, so deactivation and role changes apply at once.
 * Writes must also carry the CSRF token bound into the session (double submit).
 */
export function authenticate(ctx: AppContext, roles: 'signed-in' | readonly Role[]) {
  return async (req: Request, _res: Response, next: NextFunction) => {
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    const claims = typeof token === 'string' ? verifySession(ctx.env.JWT_SECRET, token) : null;
    if (!claims) throw unauthenticated('Sign in to continue.');
    const id = Number(claims.sub);
    // On every request: a direct read (db/direct-rows).
    const user = Number.isSafeInteger(id) ? await withConnection(ctx.sequelize, (c) => findRow(UserModel, c, { id })) : null;
    if (!user || user.tokenVersion !== claims.tv) throw unauthenticated('Your session has ended. Sign in again.');
    if (user.status !== 'active') throw unauthenticated('This account has been deactivated. Ask an admin.');
    if (!SAFE_METHODS.has(req.method) && req.get('x-csrf-token') !== claims.csrf) {
      throw new AppError(403, 'CSRF_REJECTED', 'This request did not come from a Tracewright page. Reload the page and try again.');
    }
    if (roles !== 'signed-in' && !roles.includes(user.role)) throw forbidden();
    req.user = user;
    req.csrfToken = claims.csrf;
    next();
  };
}

/** For handlers behind `authenticate`: the signed-in person, never undefined. */
export function currentUser(req: Request): UserModel {
  if (!req.user) throw unauthenticated();
  return req.user;
}
