import { http, HttpResponse } from 'msw';

import type { DeviationDetail, DeviationQueue } from '@tracewright/shared';

export const ASSIGNEES = [
  { id: 1, name: 'Robin Vale' },
  { id: 5, name: 'Ada Kerr' },
];

const LENS_HEATER = {
  id: 12,
  code: 'LENS-HEAT-2',
  name: 'Lens-wrap heater',
  product: 'Heated lens wrap',
  notes: '',
  archived: false,
  version: 1,
  createdAt: '2026-10-01T08:00:00Z',
  updatedAt: '2026-10-01T08:00:00Z',
  latestVersion: null,
  releasedVersion: null,
};

/** The side lists the queue's filters and the detail's pickers read. */
export function pickerLists() {
  return [
    http.get('/api/deviations/assignees', () => HttpResponse.json({ people: ASSIGNEES })),
    http.get('/api/deviations/operators', () => HttpResponse.json({ people: [{ id: 9, name: 'Mika Sato' }] })),
    http.get('/api/recipes', () => HttpResponse.json({ recipes: [LENS_HEATER] })),
    http.get('/api/runs', () => HttpResponse.json({ runs: [], total: 0 })),
  ];
}

/** The queue answers with `queue` and records every query string it was asked with. */
export function queueApi(queue: DeviationQueue, asked: URLSearchParams[] = []) {
  return http.get('/api/deviations', ({ request }) => {
    asked.push(new URL(request.url).searchParams);
    return HttpResponse.json(queue);
  });
}

export function deviationApi(deviation: DeviationDetail) {
  return http.get(`/api/deviations/${deviation.id}`, () => HttpResponse.json(deviation));
}
