import { QueryClient } from '@tanstack/react-query';
import { http, HttpResponse } from 'msw';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';

import { server } from '../../../test/msw-server';
import { runViewKeys } from './api/run-view-keys';
import { prefetchRunOfPage } from './run-view-routes';
import { setBenchStore } from './storage/bench-store-instance';
import { createMemoryBenchStore } from './storage/memory-bench-store';
import { aRun } from './testing/run-fixtures';

beforeEach(() => setBenchStore(createMemoryBenchStore({ isDurable: true })));
afterEach(() => setBenchStore(null));

describe('asking for the run when the app starts on a run view', () => {
  it('when the page is /run/7, then the run is fetched into the cache the route will read', async () => {
    const asked: string[] = [];
    server.use(
      http.get('/api/runs/:id', ({ request }) => {
        asked.push(new URL(request.url).pathname);
        return HttpResponse.json(aRun());
      }),
    );
    const queryClient = new QueryClient();
    prefetchRunOfPage(queryClient, '/run/7');
    await expect.poll(() => queryClient.getQueryState(runViewKeys.detail(7))?.status).toBe('success');
    expect(asked).toEqual(['/api/runs/7']);
  });

  it.each(['/run/scan', '/runs/7', '/run/07', '/run/7/extra', '/'])('when the page is %s, then nothing is fetched', (path) => {
    const queryClient = new QueryClient();
    prefetchRunOfPage(queryClient, path);
    expect(queryClient.getQueryCache().getAll()).toEqual([]);
  });
});
