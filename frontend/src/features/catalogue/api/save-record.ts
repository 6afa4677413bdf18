import { useMutation, useQueryClient } from '@tanstack/react-query';

import { apiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';
import { CATALOGUE_RESOURCES, type CatalogueInputs, type CatalogueKind, type CatalogueRecords } from './catalogue-resources';

/** `id` and `version` are absent for a new record; an update names the version it was based on. */
export type SaveRecordVariables<K extends CatalogueKind> = { input: CatalogueInputs[K]; id?: number; version?: number };

export async function saveRecord<K extends CatalogueKind>(kind: K, { input, id, version }: SaveRecordVariables<K>): Promise<CatalogueRecords[K]> {
  const resource = CATALOGUE_RESOURCES[kind];
  const body = id === undefined ? await apiClient.post(resource.path, input) : await apiClient.put(`${resource.path}/${id}`, { ...input, version });
  return resource.parseRecord(body);
}

/** Creates or updates; afterwards every catalogue view is refetched (names and fits depend on each other). */
export function useSaveRecord<K extends CatalogueKind>(kind: K) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (variables: SaveRecordVariables<K>) => saveRecord(kind, variables),
    onSuccess: async (saved) => {
      queryClient.setQueryData(catalogueKeys.detail(kind, saved.id), saved);
      await queryClient.invalidateQueries({ queryKey: catalogueKeys.all });
    },
  });
}
