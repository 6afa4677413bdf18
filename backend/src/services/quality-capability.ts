import { QueryTypes } from 'sequelize';

import { LOW_CPK, LOW_CPK_MIN_POINTS, trendFigures, type QualityDashboard } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { RecipeModel } from '../models/recipe.model';
import { recipeSpecs } from './trend-data';

interface StandingReading {
  recipe_id: number;
  spec_id: string;
  value: number;
  corrected_value: number | null;
  excluded: number | null;
}

/**
 * Specs whose Cpk is below LOW_CPK (1.33, Montgomery's minimum for an existing process) with at
 * least LOW_CPK_MIN_POINTS included points: the same figures as the trend page, read for every
 * spec in two queries (standing readings in time order, with the note in force on each).
 */
export async function lowCapabilitySpecs(ctx: AppContext): Promise<QualityDashboard['lowCapability']> {
  const readings = await ctx.sequelize.query<StandingReading>(
    `SELECT r.recipe_id, rr.spec_id, rr.value, rr.corrected_value, n.excluded
     FROM run_readings rr
     JOIN runs r ON r.id = rr.run_id
     LEFT JOIN (SELECT reading_id, MAX(id) AS id FROM trend_point_notes GROUP BY reading_id) latest ON latest.reading_id = rr.id
     LEFT JOIN trend_point_notes n ON n.id = latest.id
     WHERE rr.superseded_by_id IS NULL
     ORDER BY rr.recorded_at ASC, rr.id ASC`,
    { type: QueryTypes.SELECT },
  );
  const series = new Map<string, { recipeId: number; specId: string; values: number[] }>();
  for (const r of readings) {
    if (r.excluded) continue;
    const key = `${r.recipe_id}|${r.spec_id}`;
    const entry = series.get(key) ?? { recipeId: Number(r.recipe_id), specId: r.spec_id, values: [] };
    entry.values.push(r.corrected_value ?? r.value);
    series.set(key, entry);
  }
  const candidates = [...series.values()].filter((s) => s.values.length >= LOW_CPK_MIN_POINTS);
  const recipeIds = [...new Set(candidates.map((c) => c.recipeId))];
  const [specs, recipes] = await Promise.all([recipeSpecs(recipeIds), RecipeModel.findAll({ where: { id: recipeIds }, attributes: ['id', 'code'] })]);
  return candidates
    .flatMap((c) => {
      const spec = specs.get(c.recipeId)?.get(c.specId);
      const cpk = spec ? trendFigures(c.values, spec, null).capability?.cpk : undefined;
      if (!spec || cpk === undefined || !(cpk < LOW_CPK)) return [];
      return [{ recipeId: c.recipeId, recipeCode: recipes.find((r) => r.id === c.recipeId)?.code ?? '', specId: c.specId, specName: spec.name, cpk, n: c.values.length }];
    })
    .sort((a, b) => a.cpk - b.cpk);
}
