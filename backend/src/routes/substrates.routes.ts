import { IdParamsSchema, SubstrateInputSchema, SubstrateUpdateSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { getSubstrateWetting, substrateCatalogue } from '../services/substrate.service';
import { catalogueRoutes } from './catalogue.routes';
import { route, type RouteSpec } from './route-table';

export function substrateRoutes(ctx: AppContext): RouteSpec[] {
  return [
    ...catalogueRoutes(ctx, {
      path: '/api/substrates',
      listKey: 'substrates',
      catalogue: substrateCatalogue,
      inputSchema: SubstrateInputSchema,
      updateSchema: SubstrateUpdateSchema,
    }),
    route('get', '/api/substrates/:id/wetting', 'signed-in', async (req, res) => {
      res.json(await getSubstrateWetting(IdParamsSchema.parse(req.params).id));
    }),
  ];
}
