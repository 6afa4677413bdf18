import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import type { RouteObject } from 'react-router';

import { RouteErrorBoundary } from '../../../components/errors/route-error-boundary';
import type { Loader } from '../../../lib/route-guard';
import type { CatalogueKind } from '../api/catalogue-resources';
import { listsLoader, recordLoader } from './catalogue-loaders';

export type RecordPages = {
  path: string;
  kind: CatalogueKind;
  List: ComponentType;
  New: ComponentType;
  Edit: ComponentType;
  /** The record's page: a component or a lazy one, with the record loader unless it brings its own. */
  detail: Pick<RouteObject, 'Component' | 'lazy' | 'loader'>;
  /** Lists the forms pick from (inks for printer channels, materials for lots). */
  formLists?: readonly CatalogueKind[];
  /** Lists the detail page shows besides the record. */
  detailLists?: readonly CatalogueKind[];
};

// Each page keeps the section's sub-navigation when it fails.
const page = (route: RouteObject): RouteObject => ({ ErrorBoundary: RouteErrorBoundary, ...route });

/** Table, new, detail and edit for one catalogue; only engineers and admins reach the forms. */
export function recordRoutes(queryClient: QueryClient, forEditors: (loader: Loader) => Loader, pages: RecordPages): RouteObject[] {
  const { path, kind, formLists = [], detailLists = [] } = pages;
  const detail: RouteObject = { loader: recordLoader(queryClient, kind, detailLists), ...pages.detail };
  return [
    page({ path, loader: listsLoader(queryClient, [kind]), Component: pages.List }),
    page({ path: `${path}/new`, loader: forEditors(listsLoader(queryClient, formLists)), Component: pages.New }),
    page({ path: `${path}/:id`, ...detail }),
    page({ path: `${path}/:id/edit`, loader: forEditors(recordLoader(queryClient, kind, formLists)), Component: pages.Edit }),
  ];
}
