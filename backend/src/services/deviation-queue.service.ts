import { Op, QueryTypes, type Sequelize } from 'sequelize';

import { ageDays, DEVIATION_STATES, FULLTEXT_MIN_WORD, type DeviationQuery, type DeviationQueue, type DraftContent } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { DeviationModel } from '../models/deviation.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import { RunModel } from '../models/run.model';
import { queueFilter, QUEUE_ORDER } from './deviation-queue-filters';
import { peopleNames, personRef, versionContent } from './recipe-dto';
import { toDeviationSummary } from './run-dto';
import { getLabSettings } from './settings.service';

type QueueItem = DeviationQueue['items'][number];

const minWords = new WeakMap<Sequelize, Promise<number>>();

/**
 * The shortest word the server's FULLTEXT index holds (innodb_ft_min_token_size), read once per
 * pool: a server left at the stock 3 keeps 2-letter words on the LIKE path, so results stay right.
 */
function fulltextMinWord(sequelize: Sequelize): Promise<number> {
  let found = minWords.get(sequelize);
  if (!found) {
    found = sequelize
      .query<{ n: number | string }>('SELECT @@innodb_ft_min_token_size AS n', { type: QueryTypes.SELECT })
      .then((rows) => Number(rows[0]?.n ?? FULLTEXT_MIN_WORD))
      .catch((error: unknown) => {
        minWords.delete(sequelize);
        throw error;
      });
    minWords.set(sequelize, found);
  }
  return found;
}

/** Deviations per state under the other filters, every state listed (0 when none). */
async function countsByState(ctx: AppContext, query: DeviationQuery, timeZone: string, minWord: number): Promise<Record<string, number>> {
  const { where, replacements } = queueFilter(query, timeZone, false, minWord);
  const rows = await ctx.sequelize.query<{ state: string; n: number | string }>(`SELECT state, COUNT(*) AS n FROM deviations WHERE ${where} GROUP BY state`, {
    replacements,
    type: QueryTypes.SELECT,
  });
  const counts: Record<string, number> = Object.fromEntries(DEVIATION_STATES.map((s) => [s, 0]));
  for (const row of rows) counts[row.state] = Number(row.n);
  return counts;
}

async function pageIds(ctx: AppContext, query: DeviationQuery, timeZone: string, minWord: number): Promise<number[]> {
  const { where, replacements } = queueFilter(query, timeZone, true, minWord);
  const rows = await ctx.sequelize.query<{ id: number }>(`SELECT id FROM deviations WHERE ${where} ORDER BY ${QUEUE_ORDER[query.sort]} LIMIT :limit OFFSET :offset`, {
    replacements: { ...replacements, limit: query.pageSize, offset: (query.page - 1) * query.pageSize },
    type: QueryTypes.SELECT,
  });
  return rows.map((r) => Number(r.id));
}

/** Queue rows with their run, recipe, step, people and age; every lookup is one query for the page. */
export async function queueItems(ctx: AppContext, rows: readonly DeviationModel[]): Promise<QueueItem[]> {
  const byIds = (ids: readonly number[]) => ({ where: { id: { [Op.in]: [...new Set(ids)] } } });
  const runs = await RunModel.findAll({ ...byIds(rows.map((r) => r.runId)), attributes: ['id', 'code', 'versionId'] });
  const [recipes, versions, people] = await Promise.all([
    RecipeModel.findAll({ ...byIds(rows.map((r) => r.recipeId)), attributes: ['id', 'code'] }),
    RecipeVersionModel.findAll({ ...byIds(runs.map((r) => r.versionId)), attributes: ['id', 'content'] }),
    peopleNames(rows.flatMap((r) => [r.createdBy, r.assigneeId])),
  ]);
  const contents = new Map<number, DraftContent>(versions.map((v) => [v.id, versionContent(v)]));
  const now = ctx.clock.now();
  return rows.map((row) => {
    const run = runs.find((r) => r.id === row.runId);
    const step = row.stepId === null || !run ? undefined : contents.get(run.versionId)?.steps.find((s) => s.id === row.stepId);
    return {
      ...toDeviationSummary(row, people),
      runCode: run?.code ?? `#${row.runId}`,
      recipeCode: recipes.find((r) => r.id === row.recipeId)?.code ?? '',
      stepKind: row.stepKind ?? step?.kind ?? null,
      stepTitle: step?.title ?? null,
      assignee: personRef(people, row.assigneeId),
      ageDays: ageDays(row.createdAt, now),
    };
  });
}

/**
 * GET /api/deviations: one page of the queue under the filters, the total, and the count per
 * state under the same filters without the state one (so the state tabs show what each holds).
 */
export async function listDeviations(ctx: AppContext, query: DeviationQuery): Promise<DeviationQueue> {
  const { timeZone } = await getLabSettings();
  const minWord = query.q ? await fulltextMinWord(ctx.sequelize) : FULLTEXT_MIN_WORD;
  const [counts, ids] = await Promise.all([countsByState(ctx, query, timeZone, minWord), pageIds(ctx, query, timeZone, minWord)]);
  const states: readonly string[] = query.state?.length ? [...new Set(query.state)] : DEVIATION_STATES;
  const total = states.reduce<number>((sum, s) => sum + (counts[s] ?? 0), 0);
  const rows = ids.length === 0 ? [] : await DeviationModel.findAll({ where: { id: { [Op.in]: ids } } });
  const ordered = ids.flatMap((id) => rows.filter((r) => r.id === id));
  return { items: await queueItems(ctx, ordered), total, countsByState: counts };
}
