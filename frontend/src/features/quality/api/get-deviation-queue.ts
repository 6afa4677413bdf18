import { queryOptions } from '@tanstack/react-query';

import { DeviationQueueSchema, type DeviationQuery } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

/** The query string the API reads: lists as comma lists, nothing for an empty filter. */
export function queueRequestQuery(query: DeviationQuery): Record<string, string | number | undefined> {
  return {
    state: query.state?.join(','),
    severity: query.severity?.join(','),
    rule: query.rule?.join(','),
    recipeId: query.recipeId,
    runId: query.runId,
    stepKind: query.stepKind,
    operatorId: query.operatorId,
    from: query.from,
    to: query.to,
    q: query.q,
    sort: query.sort,
    page: query.page,
    pageSize: query.pageSize,
  };
}

export async function getDeviationQueue(query: DeviationQuery, signal?: AbortSignal) {
  return DeviationQueueSchema.parse(await apiClient.get('/api/deviations', { query: queueRequestQuery(query), signal }));
}

export const deviationQueueQueryOptions = (query: DeviationQuery) =>
  queryOptions({ queryKey: qualityKeys.queue(query), queryFn: ({ signal }) => getDeviationQueue(query, signal) });
