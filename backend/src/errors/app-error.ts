import type { ErrorCode } from '@tracewright/shared';

/** The one error type services throw; the error handler turns it into `{ error: { code, message } }`. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notFound = (what: string, id?: string | number) =>
  new AppError(404, 'NOT_FOUND', id === undefined ? `${what} not found.` : `${what} ${id} was not found.`);
export const unauthenticated = (message = 'Sign in to continue.') => new AppError(401, 'UNAUTHENTICATED', message);
export const forbidden = (message = 'Your role does not allow this.') => new AppError(403, 'FORBIDDEN', message);
export const conflict = (message: string, details?: unknown) => new AppError(409, 'CONFLICT', message, details);
export const unprocessable = (message: string, details?: unknown) =>
  new AppError(422, 'UNPROCESSABLE', message, details);
export const badRequest = (message: string, details?: unknown) =>
  new AppError(400, 'VALIDATION_FAILED', message, details);

/** 422 that names the field to fix, in the shape of `z.flattenError` so forms show it in place. */
export const fieldProblem = (field: string, message: string) =>
  unprocessable(message, { formErrors: [], fieldErrors: { [field]: [message] } });

/** Optimistic concurrency: the record changed since the person loaded it. */
export const staleVersion = (noun: string, currentVersion: number) =>
  conflict(
    `Someone else saved this ${noun} first (it is now at version ${currentVersion}). Nothing was lost: their changes are saved and yours are still on your screen. Reload to see theirs, then apply yours again.`,
    { currentVersion },
  );
