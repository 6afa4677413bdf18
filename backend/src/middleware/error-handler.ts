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
    const trouble = databaseTrouble(err);
    if (trouble) {
      ctx.logger.warn({ err: { message: (err as Error).message, code: trouble.code }, path: req.path }, trouble.kind === 'down' ? 'database unavailable' : 'database busy');
      const message = trouble.kind === 'down' ? 'The database is not answering. Your work is safe; try again in a few seconds.' : 'The database is busy with other writes. Nothing was saved; try again.';
      res.set('Retry-After', trouble.kind === 'down' ? '5' : '1').status(503).json(body('SERVICE_UNAVAILABLE', message));
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

/**
 * Codes meaning the database is away or the line to it broke: the server was killed or is
 * restarting, a socket was reset, the pool could not get a connection in time. Node's socket
 * codes, the mariadb connector's own (450xx) and the server's.
 */
const CONNECTION_LOSS = new Set([
  'ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'EADDRNOTAVAIL', 'PROTOCOL_CONNECTION_LOST',
  'ER_CONNECTION_ALREADY_CLOSED', 'ER_CMD_NOT_EXECUTED_DESTROYED', 'ER_SOCKET_UNEXPECTED_CLOSE', 'ER_CONNECTION_TIMEOUT', 'ER_CMD_CONNECTION_CLOSED',
  'ER_SOCKET', 'ER_SOCKET_TIMEOUT', 'ER_GET_CONNECTION_TIMEOUT', 'ER_POOL_ALREADY_CLOSED', 'ER_CLOSING_POOL', 'ER_ADD_CONNECTION_CLOSED_POOL',
  'ER_INITIAL_TIMEOUT_ERROR', 'ER_PING_TIMEOUT',
  'ER_SERVER_SHUTDOWN', 'ER_CONNECTION_KILLED', 'ER_CON_COUNT_ERROR', 'ER_ABORTING_CONNECTION', 'ER_NEW_ABORTING_CONNECTION',
  'ER_NET_READ_ERROR', 'ER_NET_READ_INTERRUPTED', 'ER_NET_ERROR_ON_WRITE', 'ER_NET_WRITE_INTERRUPTED', 'ER_QUERY_INTERRUPTED',
]);

/** Contention between writes: InnoDB gave up on a lock and rolled the transaction back, so a retry is safe. */
const CONTENTION = new Set(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT', 'ER_STATEMENT_TIMEOUT']);

/**
 * Whether an error is the database's trouble rather than the request's: `down` (unreachable or
 * connection lost mid-request, even on COMMIT) or `busy` (lock contention). Either is a 503 the
 * client may retry; with an Idempotency-Key the retry replays a write that did commit.
 * Sequelize wraps the driver's error (`parent`/`original`), so the whole chain is searched.
 *
 * @example databaseTrouble(new DatabaseError(Object.assign(new Error('read ECONNRESET'), { code: 'ECONNRESET' }))) // { kind: 'down', code: 'ECONNRESET' }
 */
export function databaseTrouble(err: unknown): { kind: 'down' | 'busy'; code: string } | null {
  if (err instanceof ConnectionError) return { kind: 'down', code: err.name };
  const seen = new Set<unknown>();
  for (let e: unknown = err; typeof e === 'object' && e !== null && !seen.has(e); ) {
    seen.add(e);
    const { code, fatal, sqlState } = e as { code?: unknown; fatal?: unknown; sqlState?: unknown };
    if (typeof code === 'string' && CONTENTION.has(code)) return { kind: 'busy', code };
    if (typeof code === 'string' && CONNECTION_LOSS.has(code)) return { kind: 'down', code };
    // The connector marks an error fatal when its connection is unusable; sqlState tells it is one of the driver's.
    if (fatal === true && typeof sqlState === 'string') return { kind: 'down', code: typeof code === 'string' ? code : 'fatal' };
    const next = e as { parent?: unknown; original?: unknown; cause?: unknown };
    e = next.parent ?? next.original ?? next.cause;
  }
  return null;
}
