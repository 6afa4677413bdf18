import { ApiErrorBodySchema } from '@tracewright/shared';

import { takeEarlyGet } from '../../../early-requests';
import { CSRF_COOKIE, CSRF_HEADER } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { readCookie } from '../../../lib/cookies';

/** Set by the service worker on answers it served from its cache (see vite.config.ts). */
export const SW_CACHE_HEADER = 'X-Tracewright-Cache';

type BenchRequest = {
  method: 'GET' | 'POST';
  path: string;
  json?: unknown;
  form?: FormData;
  idempotencyKey?: string;
  signal?: AbortSignal;
};

export type BenchResponse = { body: unknown; headers: Headers };

const UNREACHABLE = "Can't reach the server. Check the Wi-Fi; what you record stays on this tablet meanwhile.";

/**
 * The run view's fetch. apiClient (lib) sends neither an `Idempotency-Key` nor multipart forms
 * and hides the answer's headers, all of which the outbox needs; everything else is the same:
 * same-origin cookies, the double-submit CSRF header, and `ApiError` for every failure.
 */
export async function benchFetch({ method, path, json, form, idempotencyKey, signal }: BenchRequest): Promise<BenchResponse> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (json !== undefined) headers['Content-Type'] = 'application/json';
  if (idempotencyKey) headers['Idempotency-Key'] = idempotencyKey;
  if (method !== 'GET') {
    const csrf = readCookie(CSRF_COOKIE);
    if (csrf) headers[CSRF_HEADER] = csrf;
  }
  let response: Response;
  try {
    // The run's first GET may have been sent before the app ran (src/early-requests.ts).
    const early = method === 'GET' ? takeEarlyGet(path) : undefined;
    response = await (early ??
      fetch(new URL(path, window.location.origin), {
        method,
        headers,
        credentials: 'same-origin',
        body: form ?? (json === undefined ? undefined : JSON.stringify(json)),
        signal,
      }));
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, 'SERVICE_UNAVAILABLE', UNREACHABLE);
  }
  const text = await response.text();
  let body: unknown;
  try {
    body = text ? JSON.parse(text) : undefined;
  } catch {
    body = undefined;
  }
  if (response.ok) return { body, headers: response.headers };
  const parsed = ApiErrorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    throw new ApiError(response.status, code, message, details);
  }
  const code = response.status >= 500 ? 'SERVICE_UNAVAILABLE' : 'UNPROCESSABLE';
  throw new ApiError(response.status, code, `The server answered ${response.status}.`);
}
