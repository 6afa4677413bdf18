import type { z } from 'zod';

import { ArchiveInputSchema, CatalogueQuerySchema, IdParamsSchema, PERMISSIONS } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import type { Catalogue } from '../services/catalogue.service';
import { route, type RouteSpec } from './route-table';

export interface CatalogueRoutesSpec<In, View> {
  /** e.g. '/api/heat-sources' */
  path: string;
  /** The list answer's key, e.g. 'heatSources' → `{ heatSources: [...] }`. */
  listKey: string;
  catalogue: Catalogue<In, View>;
  inputSchema: z.ZodType<In>;
  updateSchema: z.ZodType<In & { version: number }>;
}

/** The six routes every catalogue has: list, read, create, update, archive, restore. */
export function catalogueRoutes<In, View>(ctx: AppContext, spec: CatalogueRoutesSpec<In, View>): RouteSpec[] {
  const { path, listKey, catalogue } = spec;
  const setArchived = (archived: boolean) =>
    route('post', `${path}/:id/${archived ? 'archive' : 'restore'}`, PERMISSIONS.editCatalogue, async (req, res) => {
      const { id } = IdParamsSchema.parse(req.params);
      // A bare POST carries no body; the version is optional here.
      res.json(await catalogue.setArchived(ctx, currentUser(req), id, archived, ArchiveInputSchema.parse(req.body ?? {})));
    });
  return [
    route('get', path, 'signed-in', async (req, res) => {
      res.json({ [listKey]: await catalogue.list(ctx, CatalogueQuerySchema.parse(req.query)) });
    }),
    route('get', `${path}/:id`, 'signed-in', async (req, res) => {
      res.json(await catalogue.get(ctx, IdParamsSchema.parse(req.params).id));
    }),
    route('post', path, PERMISSIONS.editCatalogue, async (req, res) => {
      res.status(201).json(await catalogue.create(ctx, currentUser(req), spec.inputSchema.parse(req.body)));
    }),
    route('put', `${path}/:id`, PERMISSIONS.editCatalogue, async (req, res) => {
      const { id } = IdParamsSchema.parse(req.params);
      res.json(await catalogue.update(ctx, currentUser(req), id, spec.updateSchema.parse(req.body)));
    }),
    setArchived(true),
    setArchived(false),
  ];
}
