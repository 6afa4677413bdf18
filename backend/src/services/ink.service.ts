import { inkPrintability, type Ink, type InkInput, type InkPrintability } from '@tracewright/shared';

import { notFound } from '../errors/app-error';
import { InkModel } from '../models/ink.model';
import { PrinterModel } from '../models/printer.model';
import { createCatalogue } from './catalogue.service';
import { toInkDto } from './material-dto';

export const inkCatalogue = createCatalogue<InkModel, InkInput, Ink>({
  model: InkModel,
  entityType: 'ink',
  noun: 'ink',
  searchColumns: ['name', 'manufacturer'],
  order: [['name', 'ASC'], ['id', 'ASC']],
  // The validated input's fields are exactly the model's columns.
  toColumns: (input) => ({ ...input }),
  toRecord: toInkDto,
  toViews: async (_ctx, rows) => rows.map(toInkDto),
});

/** The ink through every printer in use (archived printers are left out). */
export async function getInkPrintability(inkId: number): Promise<InkPrintability> {
  const ink = await InkModel.findByPk(inkId);
  if (!ink) throw notFound('Ink', inkId);
  const printers = await PrinterModel.findAll({ where: { archived: false }, order: [['name', 'ASC'], ['id', 'ASC']] });
  return inkPrintability(toInkDto(ink), printers);
}
