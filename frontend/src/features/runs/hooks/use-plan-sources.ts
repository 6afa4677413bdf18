import { useSuspenseQueries, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';

import { heatSourcesQueryOptions } from '../api/get-heat-sources';
import { inksQueryOptions } from '../api/get-inks';
import { instrumentsQueryOptions } from '../api/get-instruments';
import { lotsQueryOptions } from '../api/get-lots';
import { printersQueryOptions } from '../api/get-printers';
import { substratesQueryOptions } from '../api/get-substrates';
import { surfaceTreatersQueryOptions } from '../api/get-surface-treaters';
import type { PlanSources } from '../utils/plan-issues';

/** The options behind every catalogue list a plan draws from, in one place for loader and page. */
export const PLAN_SOURCE_QUERIES = [
  lotsQueryOptions(),
  inksQueryOptions(),
  substratesQueryOptions(),
  printersQueryOptions(),
  heatSourcesQueryOptions(),
  surfaceTreatersQueryOptions(),
  instrumentsQueryOptions(),
] as const;

/** For the loader: every list in the cache before the page shows. */
export function ensurePlanSources(queryClient: QueryClient) {
  const [lots, inks, substrates, printers, heatSources, treaters, instruments] = PLAN_SOURCE_QUERIES;
  return Promise.all([
    queryClient.ensureQueryData(lots),
    queryClient.ensureQueryData(inks),
    queryClient.ensureQueryData(substrates),
    queryClient.ensureQueryData(printers),
    queryClient.ensureQueryData(heatSources),
    queryClient.ensureQueryData(treaters),
    queryClient.ensureQueryData(instruments),
  ]);
}

export function usePlanSources(): PlanSources {
  const [lots, inks, substrates, printers, heatSources, treaters, instruments] = useSuspenseQueries({ queries: PLAN_SOURCE_QUERIES });
  // One object per change of any list, so what is derived from it (the form's schema) keeps still.
  return useMemo(
    () => ({ lots: lots.data, inks: inks.data, substrates: substrates.data, printers: printers.data, heatSources: heatSources.data, treaters: treaters.data, instruments: instruments.data }),
    [lots.data, inks.data, substrates.data, printers.data, heatSources.data, treaters.data, instruments.data],
  );
}
