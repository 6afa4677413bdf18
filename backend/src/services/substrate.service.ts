import { substrateWetting, type Substrate, type SubstrateInput, type SubstrateWetting } from '@tracewright/shared';

import { notFound } from '../errors/app-error';
import { InkModel } from '../models/ink.model';
import { SubstrateModel } from '../models/substrate.model';
import { createCatalogue } from './catalogue.service';
import { toSubstrateDto } from './material-dto';

export const substrateCatalogue = createCatalogue<SubstrateModel, SubstrateInput, Substrate>({
  model: SubstrateModel,
  entityType: 'substrate',
  noun: 'substrate',
  searchColumns: ['name', 'manufacturer'],
  order: [['name', 'ASC'], ['id', 'ASC']],
  // The validated input's fields are exactly the model's columns.
  toColumns: (input) => ({ ...input }),
  toRecord: toSubstrateDto,
  toViews: async (_ctx, rows) => rows.map(toSubstrateDto),
});

/** The substrate's surface energy against every ink in use (archived inks are left out). */
export async function getSubstrateWetting(substrateId: number): Promise<SubstrateWetting> {
  const substrate = await SubstrateModel.findByPk(substrateId);
  if (!substrate) throw notFound('Substrate', substrateId);
  const inks = await InkModel.findAll({ where: { archived: false }, order: [['name', 'ASC'], ['id', 'ASC']] });
  return substrateWetting(toSubstrateDto(substrate), inks);
}
