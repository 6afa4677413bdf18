import type { RunState } from '@tracewright/shared';

/** The home page's own reads; they are never fresh for long (staleTime 0), so opening the page asks again. */
export const homeKeys = {
  all: ['home'] as const,
  runs: (state: RunState, shown: number) => [...homeKeys.all, 'runs', state, shown] as const,
  quality: () => [...homeKeys.all, 'quality'] as const,
};
