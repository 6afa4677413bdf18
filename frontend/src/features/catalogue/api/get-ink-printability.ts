import { queryOptions } from '@tanstack/react-query';

import { InkPrintabilitySchema, type InkPrintability } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';

export async function getInkPrintability(inkId: number, signal?: AbortSignal): Promise<InkPrintability> {
  return InkPrintabilitySchema.parse(await apiClient.get(`/api/inks/${inkId}/printability`, { signal }));
}

export const inkPrintabilityQueryOptions = (inkId: number) =>
  queryOptions({ queryKey: catalogueKeys.printability(inkId), queryFn: ({ signal }) => getInkPrintability(inkId, signal) });
