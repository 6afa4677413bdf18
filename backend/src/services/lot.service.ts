import type { Transaction } from 'sequelize';

import { lotStatus, type LotInput, type LotView } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { fieldProblem } from '../errors/app-error';
import { InkModel } from '../models/ink.model';
import { MaterialLotModel } from '../models/material-lot.model';
import { SubstrateModel } from '../models/substrate.model';
import { createCatalogue } from './catalogue.service';
import { labToday } from './lab-calendar';
import { toLotRecord } from './material-dto';

export const lotCatalogue = createCatalogue<MaterialLotModel, LotInput, LotView>({
  model: MaterialLotModel,
  entityType: 'lot',
  noun: 'lot',
  searchColumns: ['lotNumber'],
  // Newest first: the lot on the bench is usually the one received last.
  order: [['receivedOn', 'DESC'], ['id', 'DESC']],
  toColumns: (input) => ({
    materialType: input.materialType,
    materialId: input.materialId,
    lotNumber: input.lotNumber,
    receivedOn: input.receivedOn,
    openedOn: input.openedOn,
    expiresOn: input.expiresOn,
    notes: input.notes,
  }),
  toRecord: toLotRecord,
  toViews: lotViews,
  checkReferences: requireMaterial,
});

/**
 * A lot must point at an existing ink or substrate. New lots may not go to an archived material;
 * a lot already on one keeps it, so its other fields can still be corrected.
 */
async function requireMaterial(input: LotInput, previous: MaterialLotModel | null, transaction: Transaction) {
  const options = { transaction, attributes: ['id', 'name', 'archived'] };
  const material =
    input.materialType === 'ink'
      ? await InkModel.findByPk(input.materialId, options)
      : await SubstrateModel.findByPk(input.materialId, options);
  const kind = input.materialType;
  if (!material) {
    throw fieldProblem('materialId', `There is no ${kind} with id ${input.materialId}. Pick the ${kind} this lot belongs to from the list.`);
  }
  const isUnchanged = previous?.materialType === input.materialType && previous.materialId === input.materialId;
  if (material.archived && !isUnchanged) {
    throw fieldProblem('materialId', `${material.name} is archived, so it takes no new lots. Restore it first, or pick another ${kind}.`);
  }
}

/** Each lot with its material's name and today's flags (expired, past pot life). */
async function lotViews(ctx: AppContext, rows: MaterialLotModel[]): Promise<LotView[]> {
  if (rows.length === 0) return [];
  const [today, materials] = await Promise.all([labToday(ctx), loadMaterials(rows)]);
  const now = ctx.clock.now();
  return rows.map((row) => {
    const material = materials.get(`${row.materialType}:${row.materialId}`);
    return {
      ...toLotRecord(row),
      materialName: material?.name ?? `Unknown ${row.materialType} ${row.materialId}`,
      status: lotStatus(row, { today, now, potLifeHours: material?.potLifeHours ?? null }),
    };
  });
}

async function loadMaterials(rows: MaterialLotModel[]) {
  const idsOf = (type: LotInput['materialType']) => [...new Set(rows.filter((r) => r.materialType === type).map((r) => r.materialId))];
  const [inks, substrates] = await Promise.all([
    InkModel.findAll({ where: { id: idsOf('ink') }, attributes: ['id', 'name', 'potLifeHours'] }),
    SubstrateModel.findAll({ where: { id: idsOf('substrate') }, attributes: ['id', 'name'] }),
  ]);
  // Substrates have no pot life; only an opened ink can run out of it.
  return new Map<string, { name: string; potLifeHours: number | null }>([
    ...inks.map((i) => [`ink:${i.id}`, { name: i.name, potLifeHours: i.potLifeHours }] as const),
    ...substrates.map((s) => [`substrate:${s.id}`, { name: s.name, potLifeHours: null }] as const),
  ]);
}
