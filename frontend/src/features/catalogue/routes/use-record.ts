import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';

import type { CatalogueKind, CatalogueRecords } from '../api/catalogue-resources';
import { recordQueryOptions } from '../api/get-record';
import { recordIdFrom } from './record-id';

/** The record named by the address; its loader has already fetched it. */
export function useRecord<K extends CatalogueKind>(kind: K): CatalogueRecords[K] {
  const id = recordIdFrom(useParams());
  return useSuspenseQuery(recordQueryOptions(kind, id)).data;
}
