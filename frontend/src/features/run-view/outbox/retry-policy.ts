import { isApiError } from '../../../lib/api-error';
import type { WriteError } from './outbox-types';

export type FailureKind = 'transient' | 'conflict' | 'refused';

/**
 * How the outbox treats a failed send. Network trouble, timeouts, rate limits and 5xx are tried
 * again later with the same key; 409 means someone else did it first (drop and say so); any
 * other 4xx stops that write and shows it to the operator.
 */
export function classifyFailure(error: unknown): FailureKind {
  if (!isApiError(error)) return 'transient';
  if (error.status === 0 || error.status === 408 || error.status === 429 || error.status >= 500) return 'transient';
  if (error.status === 409) return 'conflict';
  return 'refused';
}

export function toWriteError(error: unknown): WriteError {
  if (isApiError(error)) return { status: error.status, code: error.code, message: error.message, details: error.details };
  return { status: 0, code: 'INTERNAL', message: error instanceof Error ? error.message : 'The write could not be sent.' };
}

const FIRST_DELAY_MS = 1_000;
const LONGEST_DELAY_MS = 60_000;

/**
 * Wait before the next try: 1 s, 2 s, 4 s … up to a minute.
 * @example retryDelayMs(3) // → 4000
 */
export function retryDelayMs(attempt: number): number {
  return Math.min(LONGEST_DELAY_MS, FIRST_DELAY_MS * 2 ** Math.max(0, attempt - 1));
}
