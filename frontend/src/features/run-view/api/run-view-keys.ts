/** Query keys of the run view. */
export const runViewKeys = {
  all: ['run-view'] as const,
  detail: (runId: number) => [...runViewKeys.all, 'run', runId] as const,
  byCode: (code: string) => [...runViewKeys.all, 'code', code] as const,
};
