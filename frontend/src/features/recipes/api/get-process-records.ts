import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';

import {
  HeatSourceListSchema,
  InkListSchema,
  PrinterListSchema,
  SubstrateListSchema,
  SurfaceTreaterListSchema,
  type HeatSourceView,
  type Ink,
  type Printer,
  type Substrate,
  type SurfaceTreaterView,
} from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { recipeKeys } from './recipe-keys';

/** The lab's records a recipe points at: the pickers offer them and the live checks read them. */
export type ProcessRecords = {
  inks: Ink[];
  substrates: Substrate[];
  printers: Printer[];
  heatSources: HeatSourceView[];
  surfaceTreaters: SurfaceTreaterView[];
};

// Archived records too: an older version may name one, and the checks should say "archived", not "missing".
const ALL = { query: { archived: 'all' } };

export async function getProcessRecords(signal?: AbortSignal): Promise<ProcessRecords> {
  const get = (path: string) => apiClient.get(path, { ...ALL, signal });
  const [inks, substrates, printers, heatSources, surfaceTreaters] = await Promise.all([
    get('/api/inks').then((b) => InkListSchema.parse(b).inks),
    get('/api/substrates').then((b) => SubstrateListSchema.parse(b).substrates),
    get('/api/printers').then((b) => PrinterListSchema.parse(b).printers),
    get('/api/heat-sources').then((b) => HeatSourceListSchema.parse(b).heatSources),
    get('/api/surface-treaters').then((b) => SurfaceTreaterListSchema.parse(b).surfaceTreaters),
  ]);
  return { inks, substrates, printers, heatSources, surfaceTreaters };
}

export const processRecordsQueryOptions = () =>
  queryOptions({ queryKey: recipeKeys.records(), queryFn: ({ signal }) => getProcessRecords(signal) });

export const useProcessRecords = () => useSuspenseQuery(processRecordsQueryOptions()).data;
