import { queryOptions } from '@tanstack/react-query';

import { RecipeListSchema, RunListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

export type FilterOption = { id: number; label: string };

/** Recipes for the queue's recipe filter (everyone signed in reads the list). */
export async function getRecipeOptions(signal?: AbortSignal): Promise<FilterOption[]> {
  const { recipes } = RecipeListSchema.parse(await apiClient.get('/api/recipes', { signal }));
  return recipes.map((r) => ({ id: r.id, label: `${r.code} · ${r.name}` }));
}

/** The latest runs for the queue's run filter; older runs are reached through the text search. */
export async function getRunOptions(signal?: AbortSignal): Promise<FilterOption[]> {
  const { runs } = RunListSchema.parse(await apiClient.get('/api/runs', { query: { page: 1, pageSize: 100 }, signal }));
  return runs.map((r) => ({ id: r.id, label: `${r.code} · ${r.recipeCode}` }));
}

export const recipeOptionsQueryOptions = () =>
  queryOptions({ queryKey: qualityKeys.options('recipes'), queryFn: ({ signal }) => getRecipeOptions(signal), staleTime: 5 * 60_000 });

export const runOptionsQueryOptions = () =>
  queryOptions({ queryKey: qualityKeys.options('runs'), queryFn: ({ signal }) => getRunOptions(signal), staleTime: 60_000 });
