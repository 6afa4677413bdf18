import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

// No shared schema names this answer yet: `{ people: [{ id, name }] }`, as agreed for the pickers.
const PeopleListSchema = z.object({ people: z.array(z.object({ id: z.number().int(), name: z.string() })) });
export type PersonOption = z.infer<typeof PeopleListSchema>['people'][number];

const PATHS = { assignees: '/api/deviations/assignees', operators: '/api/deviations/operators' } as const;

/** People to pick from: who may own a deviation (assignees) and who worked the runs (operators). */
export async function getPeople(group: keyof typeof PATHS, signal?: AbortSignal): Promise<PersonOption[]> {
  return PeopleListSchema.parse(await apiClient.get(PATHS[group], { signal })).people;
}

export const peopleQueryOptions = (group: keyof typeof PATHS) =>
  queryOptions({ queryKey: qualityKeys.people(group), queryFn: ({ signal }) => getPeople(group, signal), staleTime: 5 * 60_000 });
