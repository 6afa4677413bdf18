import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { recordQueryOptions } from '../api/get-record';
import { recordsQueryOptions } from '../api/get-records';
import { inkPrintabilityQueryOptions } from '../api/get-ink-printability';
import { recordIdFrom } from './record-id';

/** The ink, its fit with every printer and the lots list, fetched together while the page's code loads. */
export const inkDetailLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = recordIdFrom(params);
    await Promise.all([
      queryClient.ensureQueryData(recordQueryOptions('inks', id)),
      queryClient.ensureQueryData(inkPrintabilityQueryOptions(id)),
      queryClient.ensureQueryData(recordsQueryOptions('lots')),
    ]);
    return null;
  };
