import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';

import { server } from '../../test/msw-server';
import { apiClient } from './api-client';
import { ApiError } from './api-error';

function captureHeaders(method: 'get' | 'post' | 'put' | 'patch' | 'delete', status = 200) {
  const seen: { headers?: Headers; credentials?: RequestCredentials } = {};
  server.use(
    http[method]('/api/probe', ({ request }) => {
      seen.headers = request.headers;
      return status === 204 ? new HttpResponse(null, { status }) : HttpResponse.json({ ok: true }, { status });
    }),
  );
  return seen;
}

describe('apiClient', () => {
  it.each(['post', 'put', 'patch', 'delete'] as const)(
    'when a %s request is sent, then X-CSRF-Token carries the tw_csrf cookie value',
    async (method) => {
      document.cookie = 'other=1; path=/';
      document.cookie = 'tw_csrf=token%2Fwith%3Dsymbols; path=/';
      const seen = captureHeaders(method);

      await apiClient[method]('/api/probe');

      expect(seen.headers?.get('X-CSRF-Token')).toBe('token/with=symbols');
    },
  );

  it('when a GET request is sent, then no CSRF header is added', async () => {
    document.cookie = 'tw_csrf=abc123; path=/';
    const seen = captureHeaders('get');

    await apiClient.get('/api/probe');

    expect(seen.headers?.has('X-CSRF-Token')).toBe(false);
  });

  it('when a body is given, then it is sent as JSON and the JSON answer is returned', async () => {
    let received: unknown;
    server.use(
      http.post('/api/echo', async ({ request }) => {
        received = { type: request.headers.get('Content-Type'), body: await request.json() };
        return HttpResponse.json({ id: 7 }, { status: 201 });
      }),
    );

    const answer = await apiClient.post('/api/echo', { name: 'Ink lot 12' });

    expect(received).toEqual({ type: 'application/json', body: { name: 'Ink lot 12' } });
    expect(answer).toEqual({ id: 7 });
  });

  it('when the server answers 204, then the call resolves with nothing', async () => {
    captureHeaders('post', 204);
    await expect(apiClient.post('/api/probe')).resolves.toBeUndefined();
  });

  it('when the server answers with an error body, then an ApiError carries status, code, message and details', async () => {
    const details = { formErrors: [], fieldErrors: { email: ['Enter a valid e-mail address.'] } };
    server.use(
      http.post('/api/probe', () =>
        HttpResponse.json({ error: { code: 'VALIDATION_FAILED', message: 'Check the fields.', details } }, { status: 400 }),
      ),
    );

    const error = await apiClient.post('/api/probe', {}).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'VALIDATION_FAILED', message: 'Check the fields.', details });
    expect((error as ApiError).flattened?.fieldErrors.email).toEqual(['Enter a valid e-mail address.']);
  });

  it('when a proxy answers 502 with HTML, then the ApiError still has a status and a plain message', async () => {
    server.use(http.get('/api/probe', () => new HttpResponse('<h1>Bad gateway</h1>', { status: 502 })));

    const error = await apiClient.get('/api/probe').catch((e: unknown) => e);

    expect(error).toMatchObject({ status: 502, code: 'INTERNAL' });
    expect((error as ApiError).message).toMatch(/502/);
  });

  it('when the network fails, then an ApiError with status 0 says the server cannot be reached', async () => {
    server.use(http.get('/api/probe', () => HttpResponse.error()));

    const error = await apiClient.get('/api/probe').catch((e: unknown) => e);

    expect(error).toMatchObject({ status: 0, code: 'SERVICE_UNAVAILABLE' });
  });

  it('when query values are given, then empty ones are left out of the address', async () => {
    let url = '';
    server.use(
      http.get('/api/list', ({ request }) => {
        url = request.url;
        return HttpResponse.json({});
      }),
    );

    await apiClient.get('/api/list', { query: { page: 2, action: '', entityType: undefined, kind: 'user' } });

    expect(new URL(url).search).toBe('?page=2&kind=user');
  });
});
