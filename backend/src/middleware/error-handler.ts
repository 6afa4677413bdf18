import type { ErrorRequestHandler } from 'express';
import { ConnectionError, UniqueConstraintError, ValidationError as SequelizeValidationError } from 'sequelize';
import { ZodError, z } from 'zod';

import { ProcessInputError, type ApiErrorBody } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { AppError } from '../errors/app-error';

const body = (code: ApiErrorBody['error']['code'], message: string, details?: unknown): ApiErrorBody => ({
  error: details === undefined ? { code, message } : { code, message, details },
});

/** The single error handler: maps known errors to 4xx/503 and hides everything else behind a 500. */
export function errorHandler(ctx: AppContext): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (err instanceof ZodError) {
      const flat = z.flattenError(err);
      const first = err.issues[0];
      res.status(400).json(body('VALIDATION_FAILED', first ? first.message : 'The request is not valid.', flat));
      return;
    }
    if (err instanceof AppError) {
      res.status(err.status).json(body(err.code, err.message, err.details));
      return;
    }
    if (err instanceof ProcessInputError) {
      // A calculation met a value no real material has (rows written before a rule existed).
      res.status(422).json(body('UNPROCESSABLE', err.message, { formErrors: [], fieldErrors: { [err.field]: [err.message] } }));
      return;
    }
    if (err instanceof UniqueConstraintError) {
      res.status(409).json(body('CONFLICT', 'A record with these values already exists.'));
      return;
    }
    if (err instanceof SequelizeValidationError) {
      res.status(400).json(body('VALIDATION_FAILED', err.errors[0]?.message ?? 'The request is not valid.'));
      return;
    }
    if (isBodyParserError(err)) {
      const status = err.status ?? 400;
      const code = status === 413 ? 'PAYLOAD_TOO_LARGE' : status === 415 ? 'UNSUPPORTED_MEDIA_TYPE' : 'VALIDATION_FAILED';
      const message =
        status === 413 ? 'The request is too large.' : status === 415 ? 'Send JSON (Content-Type: application/json).' : 'The request body is not valid JSON.';
      res.status(status).json(body(code, message));
      return;
    }
    if (err instanceof ConnectionError || isConnectionLoss(err)) {
      ctx.logger.warn({ err: { message: (err as Error).message }, path: req.path }, 'database unavailable');
      res.set('Retry-After', '5').status(503).json(body('SERVICE_UNAVAILABLE', 'The database is not answering. Your work is safe; try again in a few seconds.'));
      return;
    }
    ctx.logger.error({ err, path: req.path, method: req.method }, 'unhandled error');
    res.status(500).json(body('INTERNAL', 'Something went wrong on our side. Try again; if it keeps happening, tell your admin.'));
  };
}

function isBodyParserError(err: unknown): err is { status?: number; type: string } {
  return typeof err === 'object' && err !== null && 'type' in err && typeof (err as { type: unknown }).type === 'string' &&
    ['entity.parse.failed', 'entity.too.large', 'encoding.unsupported', 'charset.unsupported', 'request.aborted', 'entity.verify.failed'].includes((err as { type: string }).type);
}

function isConnectionLoss(err: unknown): boolean {
  const code = (err as { original?: { code?: string }; parent?: { code?: string } })?.parent?.code;
  return ['ECONNREFUSED', 'ER_CONNECTION_ALREADY_CLOSED', 'ER_SOCKET_UNEXPECTED_CLOSE', 'ER_GET_CONNECTION_TIMEOUT', 'PROTOCOL_CONNECTION_LOST'].includes(code ?? '');
}
