import { IdParamsSchema, InkInputSchema, InkUpdateSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { getInkPrintability, inkCatalogue } from '../services/ink.service';
import { catalogueRoutes } from './catalogue.routes';
import { route, type RouteSpec } from './route-table';

export function inkRoutes(ctx: AppContext): RouteSpec[] {
  return [
    ...catalogueRoutes(ctx, { path: '/api/inks', listKey: 'inks', catalogue: inkCatalogue, inputSchema: InkInputSchema, updateSchema: InkUpdateSchema }),
    route('get', '/api/inks/:id/printability', 'signed-in', async (req, res) => {
      res.json(await getInkPrintability(IdParamsSchema.parse(req.params).id));
    }),
  ];
}
