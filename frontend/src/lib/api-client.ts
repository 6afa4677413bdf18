import { ApiErrorBodySchema, type ErrorCode } from '@tracewright/shared';

import { takeEarlyGet } from '../early-requests';
import { ApiError } from './api-error';
import { readCookie } from './cookies';

type QueryValue = string | number | undefined | null;
type RequestOptions = { body?: unknown; query?: Record<string, QueryValue>; signal?: AbortSignal };
type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export const CSRF_COOKIE = 'tw_csrf';
export const CSRF_HEADER = 'X-CSRF-Token';

const FALLBACK_CODES: Record<number, ErrorCode> = {
  400: 'VALIDATION_FAILED',
  401: 'UNAUTHENTICATED',
  403: 'FORBIDDEN',
  404: 'NOT_FOUND',
  409: 'CONFLICT',
  429: 'RATE_LIMITED',
};

function buildUrl(path: string, query?: Record<string, QueryValue>): string {
  // An absolute URL keeps fetch happy outside the browser (tests) and is the same request inside it.
  const url = new URL(path, window.location.origin);
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') url.searchParams.set(key, String(value));
  }
  return url.toString();
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function toApiError(status: number, body: unknown): ApiError {
  const parsed = ApiErrorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    return new ApiError(status, code, message, details);
  }
  // A proxy or crash page rather than our error handler answered.
  const code = FALLBACK_CODES[status] ?? (status >= 500 ? 'INTERNAL' : 'UNPROCESSABLE');
  return new ApiError(status, code, `The server answered ${status}. Try again; if it keeps happening, tell your admin.`);
}

async function request(method: Method, path: string, options: RequestOptions = {}): Promise<unknown> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') {
    // Double-submit: the server compares this header with the tw_csrf cookie it set.
    const csrf = readCookie(CSRF_COOKIE);
    if (csrf) headers[CSRF_HEADER] = csrf;
  }
  let response: Response;
  try {
    // A run view's first GETs may have been sent before the app ran (src/early-requests.ts).
    const early = method === 'GET' && !options.query ? takeEarlyGet(path) : undefined;
    response = await (early ??
      fetch(buildUrl(path, options.query), {
        method,
        headers,
        credentials: 'same-origin',
        body: options.body === undefined ? undefined : JSON.stringify(options.body),
        signal: options.signal,
      }));
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, 'SERVICE_UNAVAILABLE', "Can't reach the server. Check the network connection and try again.");
  }
  const body = await readJson(response);
  if (!response.ok) throw toApiError(response.status, body);
  return body;
}

/**
 * The one way the frontend talks to the API. Answers are `unknown` on purpose: every fetcher
 * parses them with the shared schema for that endpoint.
 */
export const apiClient = {
  get: (path: string, options?: Omit<RequestOptions, 'body'>) => request('GET', path, options),
  post: (path: string, body?: unknown, options?: RequestOptions) => request('POST', path, { ...options, body }),
  put: (path: string, body?: unknown, options?: RequestOptions) => request('PUT', path, { ...options, body }),
  patch: (path: string, body?: unknown, options?: RequestOptions) => request('PATCH', path, { ...options, body }),
  delete: (path: string, options?: RequestOptions) => request('DELETE', path, options),
};
