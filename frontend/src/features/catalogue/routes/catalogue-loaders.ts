import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import type { CatalogueKind } from '../api/catalogue-resources';
import { recordQueryOptions } from '../api/get-record';
import { recordsQueryOptions } from '../api/get-records';
import { recordIdFrom } from './record-id';

/** Loads the named catalogue lists (a form's pick lists, a table) before the page shows. */
export const listsLoader =
  (queryClient: QueryClient, kinds: readonly CatalogueKind[]) =>
  async (_args?: LoaderFunctionArgs) => {
    await Promise.all(kinds.map((kind) => queryClient.ensureQueryData(recordsQueryOptions(kind))));
    return null;
  };

/** Loads one record from the address's `:id`, plus any lists its page needs. */
export const recordLoader =
  (queryClient: QueryClient, kind: CatalogueKind, lists: readonly CatalogueKind[] = []) =>
  async ({ params }: LoaderFunctionArgs) => {
    const id = recordIdFrom(params);
    await Promise.all([queryClient.ensureQueryData(recordQueryOptions(kind, id)), listsLoader(queryClient, lists)()]);
    return null;
  };
