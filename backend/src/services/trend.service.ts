import { Op, QueryTypes } from 'sequelize';
import type { z } from 'zod';

import { baselineLimits, labDayRange, trendFigures } from '@tracewright/shared';
import type { FreezeLimitsInputSchema, Trend, TrendPointNoteInputSchema, TrendQuerySchema, TrendSpecListSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { fieldProblem, notFound } from '../errors/app-error';
import { RecipeModel } from '../models/recipe.model';
import { RunReadingModel } from '../models/run-reading.model';
import { RunModel } from '../models/run.model';
import { TrendBaselineModel } from '../models/trend-baseline.model';
import { TrendPointNoteModel } from '../models/trend-point-note.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { getLabSettings } from './settings.service';
import { currentBaseline, loadSpec, recipeSpecs, trendPoints } from './trend-data';

type TrendQuery = z.infer<typeof TrendQuerySchema>;

async function loadRecipe(id: number) {
  const recipe = await RecipeModel.findByPk(id, { attributes: ['id', 'code', 'name'] });
  if (!recipe) throw notFound('Recipe', id);
  return recipe;
}

/**
 * GET /api/trends: one reading spec of a recipe across all its runs, oldest first, with the
 * individuals chart over the included points (or on the frozen baseline's centre and σ) and
 * capability against the spec's limits, both from the process library.
 */
export async function getTrend(query: TrendQuery): Promise<Trend> {
  const recipe = await loadRecipe(query.recipeId);
  const spec = await loadSpec(recipe.id, query.specId);
  const { timeZone } = await getLabSettings();
  const [points, frozen] = await Promise.all([trendPoints(recipe.id, spec.id, { range: labDayRange(query.from, query.to, timeZone) }), currentBaseline(recipe.id, spec.id)]);
  const included = points.filter((p) => !p.excluded).map((p) => p.value);
  const figures = trendFigures(included, spec, frozen);
  return { recipe: { id: recipe.id, code: recipe.code, name: recipe.name }, spec, points, frozen, ...figures };
}

/** GET /api/trends/specs: every spec of every recipe that has at least one standing reading, with how many. */
export async function listTrendSpecs(ctx: AppContext): Promise<z.infer<typeof TrendSpecListSchema>> {
  const counts = await ctx.sequelize.query<{ recipe_id: number; spec_id: string; n: number | string }>(
    `SELECT r.recipe_id, rr.spec_id, COUNT(*) AS n FROM run_readings rr JOIN runs r ON r.id = rr.run_id
     WHERE rr.superseded_by_id IS NULL GROUP BY r.recipe_id, rr.spec_id`,
    { type: QueryTypes.SELECT },
  );
  const recipeIds = [...new Set(counts.map((c) => Number(c.recipe_id)))];
  const [recipes, specs] = await Promise.all([RecipeModel.findAll({ where: { id: { [Op.in]: recipeIds } }, attributes: ['id', 'code'] }), recipeSpecs(recipeIds)]);
  const list = counts.flatMap((c) => {
    const recipe = recipes.find((r) => r.id === Number(c.recipe_id));
    const spec = specs.get(Number(c.recipe_id))?.get(c.spec_id);
    return recipe && spec ? [{ recipeId: recipe.id, recipeCode: recipe.code, specId: spec.id, name: spec.name, unit: spec.unit, points: Number(c.n) }] : [];
  });
  return { specs: list.sort((a, b) => a.recipeCode.localeCompare(b.recipeCode) || a.name.localeCompare(b.name)) };
}

/** Excludes a point from a trend's limits, takes it back, or annotates it; always with a reason, kept as history and audited. */
export async function notePoint(ctx: AppContext, actor: UserModel, input: z.infer<typeof TrendPointNoteInputSchema>): Promise<Trend> {
  const reading = await RunReadingModel.findByPk(input.readingId, { attributes: ['id', 'runId', 'specId', 'supersededById'] });
  if (!reading) throw notFound('Reading', input.readingId);
  if (reading.supersededById !== null) throw fieldProblem('readingId', `Reading ${reading.id} was corrected by reading ${reading.supersededById}; note that one instead.`);
  const run = await RunModel.findByPk(reading.runId, { attributes: ['id', 'recipeId'] });
  if (!run) throw notFound('Run', reading.runId);
  await ctx.sequelize.transaction(async (transaction) => {
    const previous = await TrendPointNoteModel.findOne({ where: { readingId: reading.id }, order: [['id', 'DESC']], transaction });
    const note = await TrendPointNoteModel.create({ readingId: reading.id, excluded: input.excluded, reason: input.reason, byId: actor.id, at: ctx.clock.now() }, { transaction });
    const action = input.excluded ? 'trend-point.excluded' : previous?.excluded ? 'trend-point.included' : 'trend-point.annotated';
    const before = previous ? { excluded: Boolean(previous.excluded), reason: previous.reason } : { excluded: false, reason: null };
    await recordAudit(ctx, { actorId: actor.id, action, entityType: 'run-reading', entityId: reading.id, before, after: { noteId: note.id, excluded: input.excluded, reason: input.reason }, reason: input.reason }, transaction);
  });
  return getTrend({ recipeId: run.recipeId, specId: reading.specId });
}

/**
 * Freezes a trend's limits at the mean and moving-range σ of the included points of the chosen
 * baseline runs (runs of this recipe). Later points are charted against them. Audited.
 */
export async function freezeLimits(ctx: AppContext, actor: UserModel, input: z.infer<typeof FreezeLimitsInputSchema>): Promise<Trend> {
  const recipe = await loadRecipe(input.recipeId);
  const spec = await loadSpec(recipe.id, input.specId);
  const runIds = [...new Set(input.baselineRunIds)];
  const own = await RunModel.count({ where: { id: { [Op.in]: runIds }, recipeId: recipe.id } });
  if (own !== runIds.length) throw fieldProblem('baselineRunIds', `Some of the baseline runs are not runs of ${recipe.code}. Pick runs of this recipe.`);
  const values = (await trendPoints(recipe.id, spec.id, { runIds })).filter((p) => !p.excluded).map((p) => p.value);
  const limits = baselineLimits(values);
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await TrendBaselineModel.create({ recipeId: recipe.id, specId: spec.id, runIds, ...limits, reason: input.reason, byId: actor.id, at: ctx.clock.now() }, { transaction });
    const after = { baselineId: row.id, recipeId: recipe.id, specId: spec.id, runIds, ...limits, points: values.length };
    await recordAudit(ctx, { actorId: actor.id, action: 'trend.limits-frozen', entityType: 'trend', entityId: `${recipe.id}:${spec.id}`, after, reason: input.reason }, transaction);
  });
  return getTrend({ recipeId: recipe.id, specId: spec.id });
}
