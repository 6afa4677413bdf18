import { Op } from 'sequelize';

import { lotStatus, type RunDetail } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { HeatSourceModel } from '../models/heat-source.model';
import { InkModel } from '../models/ink.model';
import { InstrumentModel } from '../models/instrument.model';
import { MaterialLotModel } from '../models/material-lot.model';
import { PrinterModel } from '../models/printer.model';
import type { RunEquipmentModel } from '../models/run-equipment.model';
import { RunLotModel } from '../models/run-lot.model';
import { SubstrateModel } from '../models/substrate.model';
import { SurfaceTreaterModel } from '../models/surface-treater.model';
import { labToday } from './lab-calendar';

const byIds = (ids: readonly number[]) => ({ where: { id: { [Op.in]: [...new Set(ids)] } } });

/** The run's lots with their material and today's flags (expired, past pot life), and the reason given. */
export async function lotViews(ctx: AppContext, runId: number): Promise<RunDetail['lots']> {
  const chosen = await RunLotModel.findAll({ where: { runId }, order: [['id', 'ASC']] });
  const lots = await MaterialLotModel.findAll(byIds(chosen.map((c) => c.lotId)));
  const [inks, substrates, today] = await Promise.all([
    InkModel.findAll({ ...byIds(lots.filter((l) => l.materialType === 'ink').map((l) => l.materialId)), attributes: ['id', 'name', 'potLifeHours'] }),
    SubstrateModel.findAll({ ...byIds(lots.filter((l) => l.materialType === 'substrate').map((l) => l.materialId)), attributes: ['id', 'name'] }),
    labToday(ctx),
  ]);
  const now = ctx.clock.now();
  return chosen.flatMap((c) => {
    const lot = lots.find((l) => l.id === c.lotId);
    if (!lot) return [];
    const ink = lot.materialType === 'ink' ? inks.find((i) => i.id === lot.materialId) : undefined;
    const material = ink ?? substrates.find((s) => s.id === lot.materialId);
    const { flags } = lotStatus(lot, { today, now, potLifeHours: ink?.potLifeHours ?? null });
    return [{ lotId: lot.id, lotNumber: lot.lotNumber, materialType: lot.materialType, materialId: lot.materialId, materialName: material?.name ?? `${lot.materialType} #${lot.materialId}`, flags, reason: c.reason }];
  });
}

/** The run's machines with names and calibration dates (printers carry none). */
export async function equipmentViews(rows: readonly RunEquipmentModel[]): Promise<RunDetail['equipment']> {
  const ids = (kind: string) => rows.filter((r) => r.kind === kind).map((r) => r.equipmentId);
  const [printers, heat, treaters, instruments] = await Promise.all([
    PrinterModel.findAll(byIds(ids('printer'))),
    HeatSourceModel.findAll(byIds(ids('heat-source'))),
    SurfaceTreaterModel.findAll(byIds(ids('surface-treater'))),
    InstrumentModel.findAll(byIds(ids('instrument'))),
  ]);
  const tables: Record<string, readonly { id: number; name: string; calibrationDueOn?: string | null }[]> = {
    printer: printers,
    'heat-source': heat,
    'surface-treater': treaters,
    instrument: instruments,
  };
  return rows.map((r) => {
    const machine = tables[r.kind]?.find((m) => m.id === r.equipmentId);
    return { kind: r.kind, id: r.equipmentId, name: machine?.name ?? `${r.kind} #${r.equipmentId}`, calibrationDueOn: machine?.calibrationDueOn ?? null, reason: r.reason };
  });
}

/** Instruments an operator may pick: every one in use, and any archived one this run already read with. */
export async function instrumentChoices(usedIds: readonly (number | null)[]): Promise<RunDetail['instruments']> {
  const used = usedIds.filter((id): id is number => id !== null);
  const rows = await InstrumentModel.findAll({ where: { [Op.or]: [{ archived: false }, { id: { [Op.in]: used } }] }, order: [['name', 'ASC']] });
  return rows.map((i) => ({ id: i.id, name: i.name, kind: i.kind, calibrationDueOn: i.calibrationDueOn }));
}
