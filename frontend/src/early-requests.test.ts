import { http, HttpResponse } from 'msw';
import { afterEach, describe, expect, it, vi } from 'vitest';

import { server } from '../test/msw-server';

afterEach(() => {
  delete (window as unknown as Record<string, unknown>).__tracewrightEarlyGets;
  window.history.replaceState(null, '', '/');
});

/** Counts the GETs of the session and of run 12, answering each with its number. */
function countRequests() {
  const seen = { session: 0, run: 0 };
  server.use(
    http.get('/api/auth/session', () => HttpResponse.json({ n: ++seen.session })),
    http.get('/api/runs/12', () => HttpResponse.json({ n: ++seen.run })),
  );
  return seen;
}

describe('early requests', () => {
  it('when the page is a run view, then the session and the run are asked for at once and the app takes those answers once, then asks afresh', async () => {
    const seen = countRequests();
    window.history.replaceState(null, '', '/run/12');
    vi.resetModules();
    await import('./early-requests');
    await vi.waitFor(() => expect(seen).toEqual({ session: 1, run: 1 }));

    const { apiClient } = await import('./lib/api-client');
    expect(await apiClient.get('/api/auth/session')).toEqual({ n: 1 });
    expect(await apiClient.get('/api/runs/12')).toEqual({ n: 1 });
    expect(seen).toEqual({ session: 1, run: 1 });
    expect(await apiClient.get('/api/auth/session')).toEqual({ n: 2 });
  });

  it('when the page is not a run view, then nothing is asked for early', async () => {
    const seen = countRequests();
    window.history.replaceState(null, '', '/recipes');
    vi.resetModules();
    const { takeEarlyGet } = await import('./early-requests');
    expect(takeEarlyGet('/api/auth/session')).toBeUndefined();
    await new Promise((done) => setTimeout(done, 50));
    expect(seen).toEqual({ session: 0, run: 0 });
  });
});
