import type { Transaction } from 'sequelize';

import type { Printer, PrinterInput } from '@tracewright/shared';

import { fieldProblem } from '../errors/app-error';
import { InkModel } from '../models/ink.model';
import { PrinterChannelModel } from '../models/printer-channel.model';
import { PrinterModel } from '../models/printer.model';
import { createCatalogue } from './catalogue.service';
import { toPrinterDto } from './equipment-dto';

export const printerCatalogue = createCatalogue<PrinterModel, PrinterInput, Printer>({
  model: PrinterModel,
  entityType: 'printer',
  noun: 'printer',
  searchColumns: ['name', 'model'],
  order: [['name', 'ASC'], ['id', 'ASC']],
  include: [{ model: PrinterChannelModel, as: 'channels' }],
  // Channels live in their own table (saveChildren), not in a printer column.
  toColumns: ({ channels: _channels, ...columns }) => columns,
  toRecord: toPrinterDto,
  toViews: async (_ctx, rows) => rows.map(toPrinterDto),
  checkReferences: requireChannelInks,
  saveChildren: replaceChannels,
});

/**
 * Every loaded ink must exist. A channel may keep an ink that was archived after it was loaded,
 * but an archived ink cannot be newly loaded.
 */
async function requireChannelInks(input: PrinterInput, previous: PrinterModel | null, transaction: Transaction) {
  const wanted = [...new Set(input.channels.flatMap((c) => (c.inkId === null ? [] : [c.inkId])))];
  if (wanted.length === 0) return;
  const found = await InkModel.findAll({ where: { id: wanted }, attributes: ['id', 'name', 'archived'], transaction });
  const inks = new Map(found.map((ink) => [ink.id, ink]));
  const loadedBefore = new Set((previous?.channels ?? []).map((c) => c.inkId));
  for (const channel of input.channels) {
    if (channel.inkId === null) continue;
    const ink = inks.get(channel.inkId);
    if (!ink) {
      throw fieldProblem('channels', `Channel ${channel.name}: there is no ink with id ${channel.inkId}. Pick an ink from the list.`);
    }
    if (ink.archived && !loadedBefore.has(ink.id)) {
      throw fieldProblem('channels', `Channel ${channel.name}: ${ink.name} is archived. Restore it first, or load another ink.`);
    }
  }
}

/** The channel list is saved whole, in the order given (position = index). */
async function replaceChannels(printer: PrinterModel, input: PrinterInput, transaction: Transaction) {
  await PrinterChannelModel.destroy({ where: { printerId: printer.id }, transaction });
  await PrinterChannelModel.bulkCreate(
    input.channels.map((channel, position) => ({ printerId: printer.id, position, name: channel.name, inkId: channel.inkId })),
    { transaction },
  );
}
