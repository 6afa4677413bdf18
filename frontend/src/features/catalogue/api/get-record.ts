import { queryOptions } from '@tanstack/react-query';

import { apiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';
import { CATALOGUE_RESOURCES, type CatalogueKind, type CatalogueRecords } from './catalogue-resources';

export async function getRecord<K extends CatalogueKind>(kind: K, id: number, signal?: AbortSignal): Promise<CatalogueRecords[K]> {
  const resource = CATALOGUE_RESOURCES[kind];
  return resource.parseRecord(await apiClient.get(`${resource.path}/${id}`, { signal }));
}

export const recordQueryOptions = <K extends CatalogueKind>(kind: K, id: number) =>
  queryOptions({ queryKey: catalogueKeys.detail(kind, id), queryFn: ({ signal }) => getRecord(kind, id, signal) });
