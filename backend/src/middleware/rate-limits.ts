import { createHash } from 'node:crypto';

import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';

import type { AppContext } from '../app-context';
import { SESSION_COOKIE } from './session-cookies';

/**
 * Brute-force brakes for passwords and PINs, keyed by client address and target account.
 * The address is Express's req.ip, which honours X-Forwarded-For only when TRUST_PROXY says so.
 */
function limiter(
  windowMs: number,
  limit: number,
  message: string,
  account: (req: Request) => string,
  options: { skipSuccessfulRequests?: boolean } = {},
): RequestHandler {
  return rateLimit({
    ...options,
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? 'unknown')}|${account(req)}`,
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'RATE_LIMITED', message } });
    },
  });
}

const field = (req: Request, name: string) => {
  const value: unknown = (req.body as Record<string, unknown> | undefined)?.[name];
  return typeof value === 'string' || typeof value === 'number' ? String(value).toLowerCase().slice(0, 254) : '';
};

export function signInLimiter(ctx: AppContext): RequestHandler {
  const minutes = ctx.env.SIGN_IN_WINDOW_MINUTES;
  return limiter(
    minutes * 60_000,
    ctx.env.SIGN_IN_LIMIT,
    `Too many sign-in attempts. Wait ${Math.ceil(minutes)} minutes, or reset your password by e-mail.`,
    (req) => field(req, 'email'),
  );
}

export function pinLimiter(ctx: AppContext): RequestHandler {
  return limiter(5 * 60_000, ctx.env.PIN_LIMIT, 'Too many wrong PINs. Wait 5 minutes, or sign in with your password.', (req) =>
    field(req, 'userId'),
  );
}

export function resetLimiter(ctx: AppContext): RequestHandler {
  return limiter(15 * 60_000, ctx.env.SIGN_IN_LIMIT, 'Too many reset requests. Wait 15 minutes and try again.', (req) =>
    field(req, 'email'),
  );
}

/**
 * Password re-entry for an e-signature, keyed by address, the record being signed and the session
 * (a hash of its cookie: this runs before authentication), so a stranger's refused requests cannot
 * lock a reviewer out. Only refusals count, so releasing many versions in a row is never slowed.
 */
export function signatureLimiter(ctx: AppContext): RequestHandler {
  const minutes = ctx.env.SIGN_IN_WINDOW_MINUTES;
  return limiter(
    minutes * 60_000,
    ctx.env.SIGN_IN_LIMIT,
    `Too many refused signatures on this record. Wait ${Math.ceil(minutes)} minutes and try again.`,
    (req) => {
      const session: unknown = req.cookies?.[SESSION_COOKIE];
      const sessionKey = typeof session === 'string' ? createHash('sha256').update(session).digest('hex').slice(0, 24) : 'none';
      return `${req.path}|${sessionKey}`;
    },
    { skipSuccessfulRequests: true },
  );
}
