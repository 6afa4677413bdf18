import { fn, col, Op, type Transaction } from 'sequelize';

import { runProgress, type DraftContent, type RunSummary } from '@tracewright/shared';

import { DeviationModel } from '../models/deviation.model';
import type { RecipeVersionModel } from '../models/recipe-version.model';
import type { RecipeModel } from '../models/recipe.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import type { RunModel } from '../models/run.model';
import { personRef } from './recipe-dto';
import type { People } from './run-dto';

/** Step states and open deviation counts of some runs, in two queries. */
export async function runCounts(runIds: readonly number[], transaction?: Transaction) {
  const where = { runId: { [Op.in]: [...runIds] } };
  const [records, open] = await Promise.all([
    RunStepRecordModel.findAll({ where, attributes: ['runId', 'stepId', 'state'], transaction }),
    // "Open" until quality closes it: review and disposition still need someone.
    DeviationModel.findAll({
      where: { ...where, state: { [Op.ne]: 'closed' } },
      attributes: ['runId', [fn('COUNT', col('id')), 'open']],
      group: ['runId'],
      raw: true,
      transaction,
    }) as unknown as Promise<{ runId: number; open: number | string }[]>,
  ]);
  const openByRun = new Map(open.map((row) => [Number(row.runId), Number(row.open)]));
  return { records, openByRun };
}

/** A run as lists show it; progress by the shared runProgress over the version's steps. */
export function runSummary(
  run: RunModel,
  recipe: Pick<RecipeModel, 'id' | 'code' | 'name'>,
  version: Pick<RecipeVersionModel, 'id' | 'number'>,
  content: Pick<DraftContent, 'steps'>,
  counts: Awaited<ReturnType<typeof runCounts>>,
  people: People,
): RunSummary {
  const progress = runProgress(content.steps, counts.records.filter((r) => r.runId === run.id));
  return {
    id: run.id,
    code: run.code,
    state: run.state,
    recipeId: recipe.id,
    recipeCode: recipe.code,
    recipeName: recipe.name,
    versionId: version.id,
    versionNumber: version.number,
    quantity: run.quantity,
    dueOn: run.dueOn,
    doneSteps: progress.doneCount,
    totalSteps: progress.total,
    openDeviations: counts.openByRun.get(run.id) ?? 0,
    createdAt: run.createdAt.toISOString(),
    createdBy: personRef(people, run.createdBy),
  };
}
