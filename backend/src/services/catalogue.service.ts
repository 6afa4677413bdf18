import {
  Op,
  type CreationAttributes,
  type Includeable,
  type Model,
  type ModelStatic,
  type Order,
  type Transaction,
  type WhereOptions,
} from 'sequelize';

import type { ArchiveInput, CatalogueQuery } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { notFound, staleVersion } from '../errors/app-error';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';

/** Columns every material and equipment table has (migrations 0004 and 0005). */
export type CatalogueRow = Model & { id: number; version: number; archived: boolean };

/** What makes one catalogue (inks, printers, …) different from the others. */
export interface CatalogueSpec<M extends CatalogueRow, In, View> {
  model: ModelStatic<M>;
  /** Audit entity type and action prefix, e.g. 'heat-source' → 'heat-source.updated'. */
  entityType: string;
  /** How messages name one record, e.g. 'heat source'. */
  noun: string;
  /** Columns the `q` search looks in. */
  searchColumns: readonly string[];
  order: Order;
  include?: Includeable[];
  /**
   * Column values from validated input. Input schemas carry no id or archived flag; the version an
   * update names is overwritten by the bump in `saveWithNewVersion`.
   */
  toColumns(input: In): CreationAttributes<M>;
  /** The record as the audit trail keeps it (before/after). */
  toRecord(row: M): object;
  /** Rows as the API answers them, with lookups and status done once per list. */
  toViews(ctx: AppContext, rows: M[]): Promise<View[]>;
  /** Refuses input pointing at records that do not exist; `previous` is the row before an update. */
  checkReferences?(input: In, previous: M | null, transaction: Transaction): Promise<void>;
  /** Writes rows owned by the record (a printer's channels). */
  saveChildren?(row: M, input: In, transaction: Transaction): Promise<void>;
}

export interface Catalogue<In, View> {
  list(ctx: AppContext, query: CatalogueQuery): Promise<View[]>;
  get(ctx: AppContext, id: number): Promise<View>;
  create(ctx: AppContext, actor: UserModel, input: In): Promise<View>;
  update(ctx: AppContext, actor: UserModel, id: number, input: In & { version: number }): Promise<View>;
  setArchived(ctx: AppContext, actor: UserModel, id: number, archived: boolean, input: ArchiveInput): Promise<View>;
}

const escapeLike = (text: string) => text.replace(/[%_\\]/g, '\\$&');

/** List, read, create, update (optimistic), archive and restore, each write audited in its transaction. */
export function createCatalogue<M extends CatalogueRow, In, View>(spec: CatalogueSpec<M, In, View>): Catalogue<In, View> {
  const load = async (id: number, transaction?: Transaction, lock = false) => {
    const row = await spec.model.findByPk(id, { transaction, include: spec.include, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
    if (!row) throw notFound(spec.noun.charAt(0).toUpperCase() + spec.noun.slice(1), id);
    return row;
  };
  const viewOf = async (ctx: AppContext, row: M) => (await spec.toViews(ctx, [row]))[0] as View;
  const audit = (ctx: AppContext, actor: UserModel, verb: string, row: M, before: object | null, transaction: Transaction) =>
    recordAudit(
      ctx,
      { actorId: actor.id, action: `${spec.entityType}.${verb}`, entityType: spec.entityType, entityId: row.id, before, after: spec.toRecord(row) },
      transaction,
    );
  // Every change bumps the version, so a screen holding an older one cannot overwrite it.
  const saveWithNewVersion = async (row: M, changes: object, transaction: Transaction) => {
    (row as Model).set({ ...changes, version: row.version + 1 });
    await row.save({ transaction });
  };

  return {
    async list(ctx, query) {
      const where: WhereOptions = {};
      if (query.archived !== 'all') Object.assign(where, { archived: query.archived === 'true' });
      if (query.q) {
        const pattern = `%${escapeLike(query.q)}%`;
        Object.assign(where, { [Op.or]: spec.searchColumns.map((column) => ({ [column]: { [Op.like]: pattern } })) });
      }
      return spec.toViews(ctx, await spec.model.findAll({ where, include: spec.include, order: spec.order }));
    },

    async get(ctx, id) {
      return viewOf(ctx, await load(id));
    },

    async create(ctx, actor, input) {
      const row = await ctx.sequelize.transaction(async (transaction) => {
        await spec.checkReferences?.(input, null, transaction);
        const created = await spec.model.create(spec.toColumns(input), { transaction });
        await spec.saveChildren?.(created, input, transaction);
        const saved = await load(created.id, transaction);
        await audit(ctx, actor, 'created', saved, null, transaction);
        return saved;
      });
      return viewOf(ctx, row);
    },

    async update(ctx, actor, id, input) {
      const row = await ctx.sequelize.transaction(async (transaction) => {
        const current = await load(id, transaction, true);
        if (current.version !== input.version) throw staleVersion(spec.noun, current.version);
        const before = spec.toRecord(current);
        await spec.checkReferences?.(input, current, transaction);
        await saveWithNewVersion(current, spec.toColumns(input), transaction);
        await spec.saveChildren?.(current, input, transaction);
        const saved = await load(id, transaction);
        await audit(ctx, actor, 'updated', saved, before, transaction);
        return saved;
      });
      return viewOf(ctx, row);
    },

    async setArchived(ctx, actor, id, archived, input) {
      const row = await ctx.sequelize.transaction(async (transaction) => {
        const current = await load(id, transaction, true);
        if (input.version !== undefined && current.version !== input.version) throw staleVersion(spec.noun, current.version);
        // Already in the asked state: nothing to change, nothing to audit.
        if (current.archived === archived) return current;
        const before = spec.toRecord(current);
        await saveWithNewVersion(current, { archived }, transaction);
        await audit(ctx, actor, archived ? 'archived' : 'restored', current, before, transaction);
        return current;
      });
      return viewOf(ctx, row);
    },
  };
}
