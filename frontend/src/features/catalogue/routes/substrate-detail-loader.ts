import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { recordQueryOptions } from '../api/get-record';
import { recordsQueryOptions } from '../api/get-records';
import { substrateWettingQueryOptions } from '../api/get-substrate-wetting';
import { recordIdFrom } from './record-id';

export const substrateDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = recordIdFrom(params);
    await Promise.all([
      queryClient.ensureQueryData(recordQueryOptions('substrates', id)),
      queryClient.ensureQueryData(substrateWettingQueryOptions(id)),
      queryClient.ensureQueryData(recordsQueryOptions('lots')),
    ]);
    return null;
  };
