import { queryOptions } from '@tanstack/react-query';

import { apiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';
import { CATALOGUE_RESOURCES, type CatalogueKind, type CatalogueRecords } from './catalogue-resources';

/**
 * The whole catalogue, archived records included: lists are short, and filtering on the page
 * answers at once while the person types.
 */
export async function getRecords<K extends CatalogueKind>(kind: K, signal?: AbortSignal): Promise<CatalogueRecords[K][]> {
  const resource = CATALOGUE_RESOURCES[kind];
  return resource.parseList(await apiClient.get(resource.path, { query: { archived: 'all' }, signal }));
}

export const recordsQueryOptions = <K extends CatalogueKind>(kind: K) =>
  queryOptions({ queryKey: catalogueKeys.list(kind), queryFn: ({ signal }) => getRecords(kind, signal) });
