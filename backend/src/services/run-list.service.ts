import { Op, type WhereOptions } from 'sequelize';

import type { RunSummary } from '@tracewright/shared';
import type { RunListQuery } from '@tracewright/shared';

import { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import { RunModel } from '../models/run.model';
import { peopleNames, versionContent } from './recipe-dto';
import { runCounts, runSummary } from './run-summary';

const escapeLike = (text: string) => text.replace(/[%_\\]/g, '\\$&');

/** GET /api/runs: newest first, by state and by run code, recipe code or recipe name; a page at a time. */
export async function listRuns(query: RunListQuery): Promise<{ runs: RunSummary[]; total: number }> {
  const where: WhereOptions = {};
  if (query.state) Object.assign(where, { state: query.state });
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    Object.assign(where, { [Op.or]: [{ code: { [Op.like]: pattern } }, { '$recipe.code$': { [Op.like]: pattern } }, { '$recipe.name$': { [Op.like]: pattern } }] });
  }
  const { rows, count } = await RunModel.findAndCountAll({
    where,
    include: [{ model: RecipeModel, as: 'recipe', attributes: ['id', 'code', 'name'] }],
    order: [['createdAt', 'DESC'], ['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  const ids = rows.map((r) => r.id);
  const [versions, counts, people] = await Promise.all([
    RecipeVersionModel.findAll({ where: { id: { [Op.in]: [...new Set(rows.map((r) => r.versionId))] } } }),
    runCounts(ids),
    peopleNames(rows.map((r) => r.createdBy)),
  ]);
  const runs = rows.flatMap((run) => {
    const recipe = (run as RunModel & { recipe?: RecipeModel }).recipe;
    const version = versions.find((v) => v.id === run.versionId);
    return recipe && version ? [runSummary(run, recipe, version, versionContent(version), counts, people)] : [];
  });
  return { runs, total: count };
}
