import { http, HttpResponse } from 'msw';

import type { Role, RecipeDetail, RecipeVersionView } from '@tracewright/shared';

import { signedInAs } from '../../../../test/api-fixtures';
import type { ProcessRecords } from '../api/get-process-records';
import { DEMO_RECORDS } from './record-fixtures';
import { aRecipeDetail, aVersionView } from './version-fixtures';

type BuilderApi = { role?: Role; versions?: RecipeVersionView[]; recipe?: RecipeDetail; records?: ProcessRecords };

/** What the builder page reads: session, the version(s), its recipe, and the lab's records. */
export function builderHandlers({ role = 'engineer', versions = [aVersionView()], recipe, records = DEMO_RECORDS }: BuilderApi = {}) {
  return [
    ...signedInAs(role, { id: 1, name: 'Robin Vale' }),
    http.get('/api/recipe-versions/:id', ({ params }) => {
      const found = versions.find((v) => v.id === Number(params.id));
      return found ? HttpResponse.json(found) : HttpResponse.json({ error: { code: 'NOT_FOUND', message: 'No such version.' } }, { status: 404 });
    }),
    http.get('/api/recipes/1', () => HttpResponse.json(recipe ?? aRecipeDetail())),
    http.get('/api/inks', () => HttpResponse.json({ inks: records.inks })),
    http.get('/api/substrates', () => HttpResponse.json({ substrates: records.substrates })),
    http.get('/api/printers', () => HttpResponse.json({ printers: records.printers })),
    http.get('/api/heat-sources', () => HttpResponse.json({ heatSources: records.heatSources })),
    http.get('/api/surface-treaters', () => HttpResponse.json({ surfaceTreaters: records.surfaceTreaters })),
  ];
}
