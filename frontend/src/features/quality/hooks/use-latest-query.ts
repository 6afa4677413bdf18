import { useLocation, useNavigation } from 'react-router';

import type { DeviationQuery } from '@tracewright/shared';

import { parseDeviationSearch } from '../utils/deviation-search';

/**
 * The queue's query a new filter should build on: the one still loading if a navigation is under
 * way, else the shown one. Two quick presses of filter chips then both count.
 */
export function useLatestQuery(shown: DeviationQuery): DeviationQuery {
  const { pathname } = useLocation();
  const { location: pending } = useNavigation();
  if (!pending || pending.pathname !== pathname) return shown;
  return parseDeviationSearch(new URLSearchParams(pending.search));
}
