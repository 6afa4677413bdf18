import type { Response } from 'express';

import type { Session } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { newCsrfToken, signDevice, signSession } from '../lib/session-token';
import type { UserModel } from '../models/user.model';
import { toSessionUser } from '../services/user-dto';

export const SESSION_COOKIE = 'tw_session';
export const CSRF_COOKIE = 'tw_csrf';
export const DEVICE_COOKIE = 'tw_device';

const secure = (ctx: AppContext) => ctx.env.PUBLIC_URL.startsWith('https://');

/** Sets the httpOnly session cookie and the readable CSRF cookie; returns the session body. */
export function startSession(ctx: AppContext, res: Response, user: UserModel, options: { trustDevice: boolean }): Session {
  const csrf = newCsrfToken();
  const token = signSession(ctx.env.JWT_SECRET, { sub: String(user.id), tv: user.tokenVersion, csrf }, ctx.env.SESSION_HOURS);
  const maxAge = ctx.env.SESSION_HOURS * 3_600_000;
  const base = { sameSite: 'strict' as const, secure: secure(ctx), path: '/' };
  res.cookie(SESSION_COOKIE, token, { ...base, httpOnly: true, maxAge });
  res.cookie(CSRF_COOKIE, csrf, { ...base, httpOnly: false, maxAge });
  if (options.trustDevice) {
    res.cookie(DEVICE_COOKIE, signDevice(ctx.env.JWT_SECRET), { ...base, httpOnly: true, maxAge: 180 * 86_400_000 });
  }
  return { user: toSessionUser(user), csrfToken: csrf };
}

export function endSession(ctx: AppContext, res: Response): void {
  const base = { sameSite: 'strict' as const, secure: secure(ctx), path: '/' };
  res.clearCookie(SESSION_COOKIE, { ...base, httpOnly: true });
  res.clearCookie(CSRF_COOKIE, base);
}
