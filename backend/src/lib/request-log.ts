import type { RequestHandler } from 'express';
import type { Logger } from 'pino';

/**
 * One line per API request once it is answered. It names the route's pattern, never the URL
 * itself: paths can carry one-time tokens (/api/auth/tokens/:token) and queries free text.
 * No headers or bodies are logged, so cookies, CSRF tokens, passwords and PINs cannot leak here.
 */
export function requestLog(logger: () => Logger): RequestHandler {
  return (req, res, next) => {
    const started = process.hrtime.bigint();
    res.on('finish', () => {
      const route = (req.route as { path?: string } | undefined)?.path ?? null;
      const ms = Number(process.hrtime.bigint() - started) / 1e6;
      const level = res.statusCode >= 500 ? 'error' : 'info';
      logger()[level]({ method: req.method, route, status: res.statusCode, ms: Math.round(ms * 10) / 10, userId: req.user?.id ?? null }, 'request');
    });
    next();
  };
}
