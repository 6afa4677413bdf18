import type { DeviationQuery } from '@tracewright/shared';

import { parseDeviationSearch } from './deviation-search';

/** The queue's form fields as the form holds them: text, '' for "any". */
export type QueueFilterValues = Record<'recipeId' | 'runId' | 'stepKind' | 'operatorId' | 'from' | 'to' | 'q' | 'sort', string>;

export function filterValuesOf(query: DeviationQuery): QueueFilterValues {
  const text = (value: string | number | undefined) => (value === undefined ? '' : String(value));
  return {
    recipeId: text(query.recipeId),
    runId: text(query.runId),
    stepKind: text(query.stepKind),
    operatorId: text(query.operatorId),
    from: text(query.from),
    to: text(query.to),
    q: text(query.q),
    sort: query.sort,
  };
}

/**
 * The query the form asks for: its fields over the chips already chosen, from page 1. Read back
 * through the address parser, so whatever the form holds becomes the same query a link would.
 */
export function queryFromValues(base: DeviationQuery, values: QueueFilterValues): DeviationQuery {
  const params = new URLSearchParams(Object.entries(values).filter(([, v]) => v.trim() !== ''));
  if (base.state?.length) params.set('state', base.state.join(','));
  if (base.severity?.length) params.set('severity', base.severity.join(','));
  if (base.rule?.length) params.set('rule', base.rule.join(','));
  params.set('pageSize', String(base.pageSize));
  return parseDeviationSearch(params);
}
