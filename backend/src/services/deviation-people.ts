import { Op, QueryTypes } from 'sequelize';

import type { PeopleList } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { UserModel } from '../models/user.model';

/** Who may own a deviation: every active quality person, by name. */
export async function listAssignees(): Promise<PeopleList> {
  const rows = await UserModel.findAll({ where: { role: 'quality', status: 'active' }, attributes: ['id', 'name'], order: [['name', 'ASC'], ['id', 'ASC']] });
  return { people: rows.map((u) => ({ id: u.id, name: u.name })) };
}

/**
 * The queue's "operator" filter is who raised the deviation (at the bench that is usually the
 * operator, but an engineer stepping in counts too), so the picker lists exactly those people.
 */
export async function listOperators(ctx: AppContext): Promise<PeopleList> {
  // DISTINCT over the (created_by, …) queue index: a short index walk, not a table scan.
  const ids = await ctx.sequelize.query<{ created_by: number }>('SELECT DISTINCT created_by FROM deviations WHERE created_by IS NOT NULL', { type: QueryTypes.SELECT });
  if (ids.length === 0) return { people: [] };
  const rows = await UserModel.findAll({ where: { id: { [Op.in]: ids.map((r) => r.created_by) } }, attributes: ['id', 'name'], order: [['name', 'ASC'], ['id', 'ASC']] });
  return { people: rows.map((u) => ({ id: u.id, name: u.name })) };
}
