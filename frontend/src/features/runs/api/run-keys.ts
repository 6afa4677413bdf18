import type { RunState } from '@tracewright/shared';

/** What the runs list is filtered by; `state` is '' for every state. */
export type RunListFilters = { state: RunState | ''; q: string; page: number; pageSize: number };

/**
 * One key factory for the runs feature. The catalogue lists it reads while planning live under
 * `sources`, so a run mutation never needs to touch them.
 */
export const runKeys = {
  all: ['runs'] as const,
  lists: () => [...runKeys.all, 'list'] as const,
  list: (filters: RunListFilters) => [...runKeys.lists(), filters] as const,
  detail: (id: number) => [...runKeys.all, 'detail', id] as const,
  signOff: (id: number) => [...runKeys.all, 'sign-off', id] as const,
  sources: () => [...runKeys.all, 'sources'] as const,
  source: (name: string) => [...runKeys.sources(), name] as const,
  version: (id: number) => [...runKeys.sources(), 'recipe-version', id] as const,
  qrAll: () => [...runKeys.all, 'qr'] as const,
  qr: (text: string) => [...runKeys.qrAll(), text] as const,
};
