import { LotInputSchema, LotUpdateSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { lotCatalogue } from '../services/lot.service';
import { catalogueRoutes } from './catalogue.routes';
import type { RouteSpec } from './route-table';

export function lotRoutes(ctx: AppContext): RouteSpec[] {
  return catalogueRoutes(ctx, { path: '/api/lots', listKey: 'lots', catalogue: lotCatalogue, inputSchema: LotInputSchema, updateSchema: LotUpdateSchema });
}
