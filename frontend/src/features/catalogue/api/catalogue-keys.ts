import type { CatalogueKind } from './catalogue-resources';

export const catalogueKeys = {
  all: ['catalogue'] as const,
  kind: (kind: CatalogueKind) => [...catalogueKeys.all, kind] as const,
  list: (kind: CatalogueKind) => [...catalogueKeys.kind(kind), 'list', { archived: 'all' }] as const,
  detail: (kind: CatalogueKind, id: number) => [...catalogueKeys.kind(kind), 'detail', id] as const,
  printability: (inkId: number) => [...catalogueKeys.all, 'printability', inkId] as const,
  wetting: (substrateId: number) => [...catalogueKeys.all, 'wetting', substrateId] as const,
};
