import { PrinterInputSchema, PrinterUpdateSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { printerCatalogue } from '../services/printer.service';
import { catalogueRoutes } from './catalogue.routes';
import type { RouteSpec } from './route-table';

export function printerRoutes(ctx: AppContext): RouteSpec[] {
  return catalogueRoutes(ctx, {
    path: '/api/printers',
    listKey: 'printers',
    catalogue: printerCatalogue,
    inputSchema: PrinterInputSchema,
    updateSchema: PrinterUpdateSchema,
  });
}
