import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { deviationQueryOptions } from '../api/get-deviation';
import { idParam } from '../utils/id-param';

export const deviationLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(deviationQueryOptions(idParam(params.deviationId)));
    return null;
  };
