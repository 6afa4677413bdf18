import { channelPlanChecks } from './channel-plan-checks';
import { cureDoseChecks } from './cure-dose-checks';
import { heatChecks } from './heat-checks';
import { jettingChecks } from './jetting-checks';
import { lineContinuityChecks } from './line-continuity-checks';
import type { ProcessCheck } from './process-check';
import { buildRecipeContext, type RecipeCheckInput } from './recipe-context';
import { referenceChecks } from './reference-checks';
import { sequenceChecks } from './sequence-checks';
import { surfaceStates } from './surface-state';
import { traceResistanceChecks } from './trace-resistance-checks';
import { wettingChecks } from './wetting-checks';

/**
 * Every live process check of a recipe version, grouped by family in the panel's order
 * (references, channel plan, jetting, wetting, line continuity, heat, cure dose, sequence,
 * expected trace resistance), each family in step order. Pure and linear in the steps: the
 * builder reruns it on every keystroke.
 *
 * @example
 * // glycerol–water through a 21 µm nozzle at 6 m/s, on a PET-like film, no heat steps
 * recipeChecks({ setup, steps: [print], inks: [ink], substrates: [film], printers: [printer], heatSources: [] })
 * // → [{ id: 'references:all', status: 'pass', … }, { id: 'channel-plan:print-1', … },
 * //    { id: 'jettability:print-1', status: 'pass', numbers: 'Z = 6.78 (window 1 < Z < 10), …' }, …]
 */
export function recipeChecks(input: RecipeCheckInput): ProcessCheck[] {
  const ctx = buildRecipeContext(input);
  const states = surfaceStates(ctx);
  return [
    ...referenceChecks(ctx),
    ...channelPlanChecks(ctx),
    ...jettingChecks(ctx),
    ...wettingChecks(ctx, states),
    ...lineContinuityChecks(ctx, states),
    ...heatChecks(ctx),
    ...cureDoseChecks(ctx),
    ...sequenceChecks(ctx),
    ...traceResistanceChecks(ctx),
  ];
}
