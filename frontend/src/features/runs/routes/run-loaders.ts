import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { heatSourcesQueryOptions } from '../api/get-heat-sources';
import { labSettingsQueryOptions } from '../api/get-lab-settings';
import { runQueryOptions } from '../api/get-run';
import { runSignOffQueryOptions } from '../api/get-run-sign-off';
import { runIdParam } from '../utils/run-id-param';

/** The run record: the run, its quality sign-off and the lab's paper size for printing. */
export const runRecordLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = runIdParam(params);
    await Promise.all([
      queryClient.ensureQueryData(runQueryOptions(id)),
      queryClient.ensureQueryData(runSignOffQueryOptions(id)),
      queryClient.ensureQueryData(labSettingsQueryOptions()),
    ]);
    return null;
  };

/** The traveller and the piece labels also name heat sources (for cautions), archived ones too. */
export const travellerLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = runIdParam(params);
    await Promise.all([
      queryClient.ensureQueryData(runQueryOptions(id)),
      queryClient.ensureQueryData(labSettingsQueryOptions()),
      queryClient.ensureQueryData(heatSourcesQueryOptions(true)),
    ]);
    return null;
  };
