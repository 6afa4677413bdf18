import { http, HttpResponse, type JsonBodyType } from 'msw';

import type { RunDetail } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';

export type SeenWrite = { path: string; key: string | null; body: unknown };

type Answer = (write: SeenWrite, attempt: number) => Response | JsonBodyType;

/**
 * A stand-in for the run API: serves the run, and keeps writes as the contract says — a repeat
 * of an Idempotency-Key answers the first response and records nothing new. `isOffline`
 * makes every request fail as a dropped network would.
 */
export function fakeRunApi(run: () => RunDetail, answer: Answer = () => ({ id: 1 })) {
  const seen: SeenWrite[] = [];
  const recorded: SeenWrite[] = [];
  const firstAnswers = new Map<string, unknown>();
  const state = { isOffline: false };

  const handlers = [
    ...signedInAs('operator', { id: 1, name: 'Robin Vale' }),
    http.get('/api/runs/:id', () => (state.isOffline ? HttpResponse.error() : HttpResponse.json(run()))),
    http.post('/api/*', async ({ request }) => {
      if (state.isOffline) return HttpResponse.error();
      const url = new URL(request.url);
      const body: unknown = request.headers.get('Content-Type')?.includes('json') ? await request.json() : null;
      const write = { path: url.pathname, key: request.headers.get('Idempotency-Key'), body };
      seen.push(write);
      if (write.key && firstAnswers.has(write.key)) return HttpResponse.json(firstAnswers.get(write.key) as JsonBodyType);
      const result = answer(write, seen.filter((w) => w.key === write.key).length);
      if (result instanceof Response) return result;
      recorded.push(write);
      if (write.key) firstAnswers.set(write.key, result);
      return HttpResponse.json(result);
    }),
  ];
  return { handlers, seen, recorded, state };
}
