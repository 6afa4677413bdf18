import { queryOptions } from '@tanstack/react-query';

import { PrinterListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function getPrinters(signal?: AbortSignal) {
  return PrinterListSchema.parse(await apiClient.get('/api/printers', { signal })).printers;
}

export const printersQueryOptions = () => queryOptions({ queryKey: runKeys.source('printers'), queryFn: ({ signal }) => getPrinters(signal), staleTime: 60_000 });
