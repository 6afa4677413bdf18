import type { Transaction } from 'sequelize';

import {
  HeatSourceInputSchema,
  InkInputSchema,
  InstrumentInputSchema,
  LotInputSchema,
  PrinterInputSchema,
  SubstrateInputSchema,
  SurfaceTreaterInputSchema,
  isoDateInZone,
} from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { HeatSourceModel } from '../models/heat-source.model';
import { InkModel } from '../models/ink.model';
import { InstrumentModel } from '../models/instrument.model';
import { MaterialLotModel } from '../models/material-lot.model';
import { PrinterChannelModel } from '../models/printer-channel.model';
import { PrinterModel } from '../models/printer.model';
import { SubstrateModel } from '../models/substrate.model';
import { SurfaceTreaterModel } from '../models/surface-treater.model';
import { recordAudit } from '../services/audit.service';
import { DEMO_HEAT_SOURCES, DEMO_INSTRUMENTS, DEMO_PRINTERS, DEMO_SURFACE_TREATERS } from './demo-equipment';
import { DEMO_INKS, DEMO_LOTS, DEMO_SUBSTRATES } from './demo-materials';
import { DEMO_SETTINGS } from './demo-people';

const addDays = (day: string, days: number) => new Date(Date.parse(`${day}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
const entries = <K extends string, V>(record: Record<K, V>) => Object.entries(record) as Array<[K, V]>;

/**
 * Demo data only: the fictional lab's inks, substrates, lots and equipment, written inside the
 * caller's seeding transaction. Every record goes through the same input schema as a form would,
 * so demo data can never hold what the API would refuse.
 */
export async function seedDemoMaterials(ctx: AppContext, transaction: Transaction): Promise<void> {
  const today = isoDateInZone(ctx.clock.now(), DEMO_SETTINGS.timeZone);
  const day = (offset: number | null) => (offset === null ? null : addDays(today, offset));
  const seeded = (entityType: string, id: number, input: object) =>
    recordAudit(ctx, { actorId: null, action: `seed.${entityType}`, entityType, entityId: id, after: { id, ...input } }, transaction);

  const inkIds = {} as Record<keyof typeof DEMO_INKS, number>;
  for (const [key, demo] of entries(DEMO_INKS)) {
    const input = InkInputSchema.parse(demo);
    inkIds[key] = (await InkModel.create(input, { transaction })).id;
    await seeded('ink', inkIds[key], input);
  }
  const substrateIds = {} as Record<keyof typeof DEMO_SUBSTRATES, number>;
  for (const [key, demo] of entries(DEMO_SUBSTRATES)) {
    const input = SubstrateInputSchema.parse(demo);
    substrateIds[key] = (await SubstrateModel.create(input, { transaction })).id;
    await seeded('substrate', substrateIds[key], input);
  }
  for (const lot of DEMO_LOTS) {
    const { material } = lot;
    const input = LotInputSchema.parse({
      materialType: material[0],
      materialId: material[0] === 'ink' ? inkIds[material[1]] : substrateIds[material[1]],
      lotNumber: lot.lotNumber,
      receivedOn: day(lot.receivedDay),
      openedOn: day(lot.openedDay),
      expiresOn: day(lot.expiresDay),
      notes: lot.notes ?? '',
    });
    await seeded('lot', (await MaterialLotModel.create(input, { transaction })).id, input);
  }
  for (const demo of DEMO_PRINTERS) {
    const { channels, ...columns } = PrinterInputSchema.parse({
      ...demo,
      channels: demo.channels.map((c) => ({ name: c.name, inkId: c.ink === null ? null : inkIds[c.ink] })),
    });
    const printer = await PrinterModel.create(columns, { transaction });
    await PrinterChannelModel.bulkCreate(
      channels.map((c, position) => ({ printerId: printer.id, position, name: c.name, inkId: c.inkId })),
      { transaction },
    );
    await seeded('printer', printer.id, { ...columns, channels });
  }
  for (const { calibrationDay, ...demo } of DEMO_HEAT_SOURCES) {
    const input = HeatSourceInputSchema.parse({ ...demo, calibrationDueOn: day(calibrationDay) });
    await seeded('heat-source', (await HeatSourceModel.create(input, { transaction })).id, input);
  }
  for (const { calibrationDay, ...demo } of DEMO_SURFACE_TREATERS) {
    const input = SurfaceTreaterInputSchema.parse({ ...demo, calibrationDueOn: day(calibrationDay) });
    await seeded('surface-treater', (await SurfaceTreaterModel.create(input, { transaction })).id, input);
  }
  for (const { calibrationDay, ...demo } of DEMO_INSTRUMENTS) {
    const input = InstrumentInputSchema.parse({ ...demo, calibrationDueOn: day(calibrationDay) });
    await seeded('instrument', (await InstrumentModel.create(input, { transaction })).id, input);
  }
}
