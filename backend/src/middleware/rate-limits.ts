import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';

import type { AppContext } from '../app-context';

/**
 * Brute-force brakes for passwords and PINs, keyed by client address and target account.
 * The address is Express's req.ip, which honours X-Forwarded-For only when TRUST_PROXY says so.
 */
function limiter(windowMs: number, limit: number, message: string, account: (req: Request) => string): RequestHandler {
  return rateLimit({
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
