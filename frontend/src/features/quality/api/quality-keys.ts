import type { DeviationQuery } from '@tracewright/shared';

/**
 * One key factory for the quality feature. Deviation writes invalidate `deviations()` (queue and
 * detail) and `dashboard()`; trend writes invalidate `trends()`.
 */
export const qualityKeys = {
  all: ['quality'] as const,
  deviations: () => [...qualityKeys.all, 'deviations'] as const,
  queue: (query: DeviationQuery) => [...qualityKeys.deviations(), 'queue', query] as const,
  detail: (id: number) => [...qualityKeys.deviations(), 'detail', id] as const,
  people: (group: 'assignees' | 'operators') => [...qualityKeys.all, 'people', group] as const,
  options: (name: 'recipes' | 'runs') => [...qualityKeys.all, 'options', name] as const,
  runSteps: (runId: number) => [...qualityKeys.all, 'run-steps', runId] as const,
  trends: () => [...qualityKeys.all, 'trends'] as const,
  trendSpecs: () => [...qualityKeys.trends(), 'specs'] as const,
  trend: (recipeId: number, specId: string) => [...qualityKeys.trends(), 'trend', recipeId, specId] as const,
  dashboard: () => [...qualityKeys.all, 'dashboard'] as const,
};
