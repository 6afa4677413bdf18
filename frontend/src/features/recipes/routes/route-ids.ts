import { data, type Params } from 'react-router';

import { IdSchema } from '@tracewright/shared';

/** A numeric id from the address, or a 404 page for anything else (e.g. /recipes/abc). */
export function routeId(params: Params, name: string): number {
  const parsed = IdSchema.safeParse(params[name]);
  if (!parsed.success) throw data(null, { status: 404 });
  return parsed.data;
}
