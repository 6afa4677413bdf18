import { Op } from 'sequelize';

import { judgedValue, latestPointNotes, selectTrendReadings, type ReadingSpec, type Trend } from '@tracewright/shared';

import { notFound } from '../errors/app-error';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunReadingModel } from '../models/run-reading.model';
import { RunModel } from '../models/run.model';
import { TrendBaselineModel } from '../models/trend-baseline.model';
import { TrendPointNoteModel } from '../models/trend-point-note.model';
import { parseJsonColumn } from './catalogue-dto';
import { versionContent } from './recipe-dto';

export type TrendSpec = Trend['spec'];

const toSpec = (spec: ReadingSpec): TrendSpec => ({ id: spec.id, name: spec.name, unit: spec.unit, target: spec.target, lowerLimit: spec.lowerLimit, upperLimit: spec.upperLimit });

/**
 * A recipe's reading specs by id, as the newest version that has each one defines it: a spec id
 * kept across versions is one trend, judged against its current name, unit and limits.
 */
export async function recipeSpecs(recipeIds: readonly number[]): Promise<Map<number, Map<string, TrendSpec>>> {
  const versions = await RecipeVersionModel.findAll({ where: { recipeId: { [Op.in]: [...recipeIds] } }, attributes: ['id', 'recipeId', 'number', 'content'], order: [['number', 'DESC']] });
  const byRecipe = new Map<number, Map<string, TrendSpec>>();
  for (const version of versions) {
    const specs = byRecipe.get(version.recipeId) ?? new Map<string, TrendSpec>();
    for (const spec of versionContent(version).steps.flatMap((s) => s.readingSpecs ?? [])) if (!specs.has(spec.id)) specs.set(spec.id, toSpec(spec));
    byRecipe.set(version.recipeId, specs);
  }
  return byRecipe;
}

export async function loadSpec(recipeId: number, specId: string): Promise<TrendSpec> {
  const spec = (await recipeSpecs([recipeId])).get(recipeId)?.get(specId);
  if (!spec) throw notFound(`Reading spec “${specId}” in recipe`, recipeId);
  return spec;
}

export type TrendPoint = Trend['points'][number];

/**
 * The points of one spec across every run of every version of the recipe: standing readings
 * (not superseded), oldest first, with the note in force on each. `runIds` narrows to some runs
 * (a baseline); `range` to an interval of time.
 */
export async function trendPoints(recipeId: number, specId: string, options: { runIds?: readonly number[]; range?: { start: Date | null; end: Date | null } } = {}): Promise<TrendPoint[]> {
  const runWhere = options.runIds ? { recipeId, id: { [Op.in]: [...options.runIds] } } : { recipeId };
  const runs = await RunModel.findAll({ where: runWhere, attributes: ['id', 'code'], raw: true });
  if (runs.length === 0) return [];
  const at: Record<symbol, Date> = {};
  if (options.range?.start) at[Op.gte] = options.range.start;
  if (options.range?.end) at[Op.lt] = options.range.end;
  // Plain rows with only the fields a point needs: model instances cost a getter per field read.
  const readings = await RunReadingModel.findAll({
    where: { specId, runId: { [Op.in]: runs.map((r) => r.id) }, supersededById: null, ...(Object.getOwnPropertySymbols(at).length > 0 ? { recordedAt: at } : {}) },
    attributes: ['id', 'runId', 'pieceId', 'value', 'correctedValue', 'recordedAt', 'supersededById'],
    raw: true,
  });
  const ids = readings.map((r) => r.id);
  const [notes, pieces] = await Promise.all([
    ids.length === 0 ? [] : TrendPointNoteModel.findAll({ where: { readingId: { [Op.in]: ids } } }),
    RunPieceModel.findAll({ where: { id: { [Op.in]: readings.flatMap((r) => (r.pieceId === null ? [] : [r.pieceId])) } }, attributes: ['id', 'code'], raw: true }),
  ]);
  const latest = latestPointNotes(notes);
  // Lookups by id: a trend can hold thousands of points, and a scan per point grows with their square.
  const runCodes = new Map(runs.map((run) => [run.id, run.code]));
  const pieceCodes = new Map(pieces.map((p) => [p.id, p.code]));
  return selectTrendReadings(readings).map((r) => ({
    readingId: r.id,
    runId: r.runId,
    runCode: runCodes.get(r.runId) ?? `#${r.runId}`,
    pieceCode: (r.pieceId === null ? null : pieceCodes.get(r.pieceId)) ?? null,
    value: judgedValue(r),
    recordedAt: r.recordedAt.toISOString(),
    excluded: latest.get(r.id)?.excluded ?? false,
    annotation: latest.get(r.id)?.reason ?? null,
  }));
}

/** The baseline in force for a recipe's spec (the newest), or null when the limits are not frozen. */
export async function currentBaseline(recipeId: number, specId: string): Promise<Trend['frozen']> {
  const row = await TrendBaselineModel.findOne({ where: { recipeId, specId }, order: [['id', 'DESC']] });
  if (!row) return null;
  return { baselineRunIds: parseJsonColumn<number[]>(row.runIds, []), mean: row.mean, sigma: row.sigma, frozenAt: row.at.toISOString(), reason: row.reason };
}
