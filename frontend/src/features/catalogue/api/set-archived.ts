import { useMutation, useQueryClient } from '@tanstack/react-query';

import { apiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';
import { CATALOGUE_RESOURCES, type CatalogueKind, type CatalogueRecords } from './catalogue-resources';

export type SetArchivedVariables = { id: number; archived: boolean; version: number };

/** Sends the version on screen, so archiving a record someone has just changed is refused (409). */
export async function setArchived<K extends CatalogueKind>(kind: K, { id, archived, version }: SetArchivedVariables): Promise<CatalogueRecords[K]> {
  const resource = CATALOGUE_RESOURCES[kind];
  return resource.parseRecord(await apiClient.post(`${resource.path}/${id}/${archived ? 'archive' : 'restore'}`, { version }));
}

export function useSetArchived<K extends CatalogueKind>(kind: K) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (variables: SetArchivedVariables) => setArchived(kind, variables),
    onSuccess: async (saved) => {
      queryClient.setQueryData(catalogueKeys.detail(kind, saved.id), saved);
      await queryClient.invalidateQueries({ queryKey: catalogueKeys.all });
    },
  });
}
