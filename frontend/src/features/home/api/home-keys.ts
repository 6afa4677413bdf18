import type { RunState } from '@tracewright/shared';

/** The home page's own reads; it refetches them whenever the page is opened. */
export const homeKeys = {
  all: ['home'] as const,
  runs: (state: RunState) => [...homeKeys.all, 'runs', state] as const,
  quality: () => [...homeKeys.all, 'quality'] as const,
};
