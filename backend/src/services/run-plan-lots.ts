import { Op, type Transaction } from 'sequelize';

import { materialsUsed, type DraftContent, type PlanRunInput } from '@tracewright/shared';

import { fieldProblem } from '../errors/app-error';
import { InkModel } from '../models/ink.model';
import { MaterialLotModel } from '../models/material-lot.model';
import { SubstrateModel } from '../models/substrate.model';

/** A lot chosen for a run, with what the shared lot rules need to judge it. */
export interface ChosenLot {
  lot: MaterialLotModel;
  materialName: string;
  /** The ink's pot life after opening (h); substrates have none. */
  potLifeHours: number | null;
  reason: string | null;
}

/**
 * The lots of a plan, each existing, listed once, and of a material the version uses (422
 * naming the field otherwise: a lot of another material would be a mix-up on the floor).
 */
export async function resolveLots(content: DraftContent, input: PlanRunInput, label: string, transaction: Transaction): Promise<ChosenLot[]> {
  const ids = input.lots.map((l) => l.lotId);
  const rows = await MaterialLotModel.findAll({ where: { id: { [Op.in]: ids } }, transaction });
  const inkIds = rows.filter((r) => r.materialType === 'ink').map((r) => r.materialId);
  const substrateIds = rows.filter((r) => r.materialType === 'substrate').map((r) => r.materialId);
  const [inks, substrates] = await Promise.all([
    InkModel.findAll({ where: { id: { [Op.in]: inkIds } }, attributes: ['id', 'name', 'potLifeHours'], transaction }),
    SubstrateModel.findAll({ where: { id: { [Op.in]: substrateIds } }, attributes: ['id', 'name'], transaction }),
  ]);
  const usedIds = materialsUsed(content);
  const used = { ink: new Set(usedIds.inkIds), substrate: new Set(usedIds.substrateIds) };
  return input.lots.map((choice, i) => {
    const field = `lots.${i}.lotId`;
    if (ids.indexOf(choice.lotId) !== i) throw fieldProblem(field, `Lot ${choice.lotId} is listed twice; list each lot once.`);
    const lot = rows.find((r) => r.id === choice.lotId);
    if (!lot) throw fieldProblem(field, `There is no lot with id ${choice.lotId}. Pick one from the list.`);
    const material = lot.materialType === 'ink' ? inks.find((m) => m.id === lot.materialId) : substrates.find((m) => m.id === lot.materialId);
    const materialName = material?.name ?? `${lot.materialType} #${lot.materialId}`;
    if (!used[lot.materialType].has(lot.materialId)) {
      throw fieldProblem(field, `Lot ${lot.lotNumber} is ${materialName}, which ${label} does not use. Pick a lot of one of its inks or substrates.`);
    }
    const potLifeHours = material && 'potLifeHours' in material ? material.potLifeHours : null;
    return { lot, materialName, potLifeHours, reason: choice.reason };
  });
}
