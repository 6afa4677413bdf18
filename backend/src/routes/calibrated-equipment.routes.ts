import {
  HeatSourceInputSchema,
  HeatSourceUpdateSchema,
  InstrumentInputSchema,
  InstrumentUpdateSchema,
  SurfaceTreaterInputSchema,
  SurfaceTreaterUpdateSchema,
} from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { heatSourceCatalogue, instrumentCatalogue, surfaceTreaterCatalogue } from '../services/calibrated-equipment.service';
import { catalogueRoutes } from './catalogue.routes';
import type { RouteSpec } from './route-table';

/** Heat sources, surface treaters and instruments: equipment with a calibration due date. */
export function calibratedEquipmentRoutes(ctx: AppContext): RouteSpec[] {
  return [
    ...catalogueRoutes(ctx, {
      path: '/api/heat-sources',
      listKey: 'heatSources',
      catalogue: heatSourceCatalogue,
      inputSchema: HeatSourceInputSchema,
      updateSchema: HeatSourceUpdateSchema,
    }),
    ...catalogueRoutes(ctx, {
      path: '/api/surface-treaters',
      listKey: 'surfaceTreaters',
      catalogue: surfaceTreaterCatalogue,
      inputSchema: SurfaceTreaterInputSchema,
      updateSchema: SurfaceTreaterUpdateSchema,
    }),
    ...catalogueRoutes(ctx, {
      path: '/api/instruments',
      listKey: 'instruments',
      catalogue: instrumentCatalogue,
      inputSchema: InstrumentInputSchema,
      updateSchema: InstrumentUpdateSchema,
    }),
  ];
}
