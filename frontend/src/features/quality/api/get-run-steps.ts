import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';

import { StepIdSchema, StepKindSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

// Only the step list of the run's recipe is read here (to pick rework steps); the rest of the
// run detail is the runs feature's business, so it is not validated twice.
const RunStepsSchema = z.object({
  content: z.object({ steps: z.array(z.object({ id: StepIdSchema, kind: StepKindSchema, title: z.string() })) }),
});
export type RunStep = z.infer<typeof RunStepsSchema>['content']['steps'][number];

export async function getRunSteps(runId: number, signal?: AbortSignal): Promise<RunStep[]> {
  return RunStepsSchema.parse(await apiClient.get(`/api/runs/${runId}`, { signal })).content.steps;
}

export const runStepsQueryOptions = (runId: number) =>
  queryOptions({ queryKey: qualityKeys.runSteps(runId), queryFn: ({ signal }) => getRunSteps(runId, signal), staleTime: 5 * 60_000 });
