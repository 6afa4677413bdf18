import type { ErrorCode } from '@tracewright/shared';

/** Shape the backend's error handler sends for a ZodError (`z.flattenError`). */
export type FlattenedErrors = { formErrors: string[]; fieldErrors: Record<string, string[] | undefined> };

/** Every non-2xx answer (and a failed network call) becomes one of these, so callers branch on one type. */
export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }

  /** The per-field messages of a 400, when the server sent them in flattened form. */
  get flattened(): FlattenedErrors | null {
    const d = this.details as Partial<FlattenedErrors> | null | undefined;
    if (!d || typeof d !== 'object' || typeof d.fieldErrors !== 'object' || d.fieldErrors === null) return null;
    return { formErrors: Array.isArray(d.formErrors) ? d.formErrors : [], fieldErrors: d.fieldErrors };
  }
}

export function isApiError(error: unknown, status?: number): error is ApiError {
  return error instanceof ApiError && (status === undefined || error.status === status);
}
