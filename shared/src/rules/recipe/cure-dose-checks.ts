import { arrheniusEquivalentMinutes } from '../../process/thermal';
import { formatNumber as f } from '../../process/units';
import type { Ink } from '../../schemas/material.schema';
import type { RecipeStep } from '../../schemas/recipe-step.schema';
import { checkMaker, guarded, stepLabel } from './check-helpers';
import { heatExposures, type HeatExposure } from './heat-exposure';
import type { ProcessCheck } from './process-check';
import type { RecipeContext } from './recipe-context';

const make = checkMaker('cure-dose');

/** A cure passes from 100 % of the ink's reference cure (equivalent minutes / reference minutes). */
export const CURE_DOSE_PASS_PERCENT = 100;

/** How many counted heat steps the numbers line spells out before "and N more". */
const LISTED_HOLDS = 4;

export interface CureDose {
  equivalentMinutes: number;
  percent: number;
  counted: HeatExposure[];
  /** Heat steps after the last pass that add nothing: below the ink's minimum effective temperature. */
  tooCold: HeatExposure[];
}

/**
 * Equivalent minutes at the ink's reference temperature of the heat steps given (Arrhenius
 * time–temperature equivalence, one activation energy, each step counted at its shortest
 * guaranteed time); steps below the ink's minimum effective temperature count nothing.
 *
 * @example
 * // Ea 80 kJ/mol, reference 150 °C / 10 min; 10 min @100 °C + 20 min @130 °C + 10 min @150 °C
 * cureDose(ink, holds) // → { equivalentMinutes: 16.948, percent: 169.48, … } (REFERENCES §5.1)
 */
export function cureDose(
  ink: Pick<Ink, 'cureReferenceTempC' | 'cureReferenceMinutes' | 'activationEnergyKJPerMol' | 'minEffectiveCureTempC'>,
  holds: readonly HeatExposure[],
): CureDose | null {
  const { cureReferenceTempC: refTemp, cureReferenceMinutes: refMinutes, activationEnergyKJPerMol: ea } = ink;
  if (refTemp === null || refMinutes === null || ea === null) return null;
  const floor = ink.minEffectiveCureTempC;
  const counted: HeatExposure[] = [];
  const tooCold: HeatExposure[] = [];
  let equivalentMinutes = 0;
  for (const h of holds) {
    if (floor !== null && h.tempC < floor) {
      tooCold.push(h);
      continue;
    }
    counted.push(h);
    equivalentMinutes += arrheniusEquivalentMinutes({ minutes: h.shortestMinutes, atTempC: h.tempC, referenceTempC: refTemp, activationEnergyKJPerMol: ea });
  }
  return { equivalentMinutes, percent: (equivalentMinutes / refMinutes) * 100, counted, tooCold };
}

function holdText(h: HeatExposure): string {
  return `${h.what} ${f(h.shortestMinutes)} min @ ${f(h.tempC)} °C`;
}

function listText(holds: readonly HeatExposure[]): string {
  const shown = holds.slice(0, LISTED_HOLDS).map(holdText).join(', ');
  return holds.length > LISTED_HOLDS ? `${shown} and ${holds.length - LISTED_HOLDS} more` : shown;
}

function judge(ink: Ink, lastIndex: number, lastStep: RecipeStep, holds: readonly HeatExposure[]): ProcessCheck {
  const base = { id: `cure-dose:ink-${ink.id}`, stepId: lastStep.id, title: `${ink.name} cure dose` };
  const dose = cureDose(ink, holds);
  const last = stepLabel(lastIndex, lastStep);
  if (!dose) {
    return make({ ...base, status: 'warning', numbers: '', why: `Can't check the cure: ${ink.name} needs its reference cure temperature and time and its activation energy on record.` });
  }
  const ref = `${f(ink.cureReferenceMinutes ?? 0)} min at ${f(ink.cureReferenceTempC ?? 0)} °C`;
  const cold = dose.tooCold.length > 0 ? `; below ${f(ink.minEffectiveCureTempC ?? 0)} °C, not counted: ${listText(dose.tooCold)}` : '';
  const counted = dose.counted.length > 0 ? `; counted: ${listText(dose.counted)}` : '';
  const numbers = `${f(dose.equivalentMinutes)} min equivalent vs ${ref} reference = ${f(dose.percent)} % (Ea ${f(ink.activationEnergyKJPerMol ?? 0)} kJ/mol)${counted}${cold}`;
  if (dose.percent >= CURE_DOSE_PASS_PERCENT) {
    return make({ ...base, status: 'pass', numbers, why: `After its last pass (${last}), ${ink.name} gets ${f(dose.percent)} % of its reference cure of ${ref}, by Arrhenius time–temperature equivalence.` });
  }
  if (holds.length === 0) {
    return make({ ...base, status: 'blocked', numbers, why: `No heat step follows the last pass of ${ink.name} (${last}), so it never cures: add a cure of at least ${ref}.` });
  }
  return make({ ...base, status: 'blocked', numbers, why: `${ink.name} gets only ${f(dose.percent)} % of its reference cure of ${ref} after its last pass (${last}), by Arrhenius time–temperature equivalence: cure longer or hotter, or its traces stay more resistive than the record says.` });
}

/**
 * Each conductive ink printed must reach its reference cure by Arrhenius equivalence, counting
 * every heat step after its last print pass (dry, cure, transfer, later heated platens), each at
 * its shortest guaranteed time, and nothing below the ink's minimum effective temperature. The
 * earlier passes of the same ink get at least as much heat, so the last pass decides.
 *
 * @example
 * // silver (Ea 80 kJ/mol, reference 10 min at 150 °C), then 10 min @100 + 20 min @130 + 10 min @150 °C
 * cureDoseChecks(ctx) // → [{ id: 'cure-dose:ink-7', status: 'pass', numbers: '16.9 min equivalent vs 10 min at 150 °C reference = 169 % …' }]
 */
export function cureDoseChecks(ctx: RecipeContext): ProcessCheck[] {
  const lastPass = new Map<number, number>();
  ctx.steps.forEach((step, i) => {
    if (step.kind === 'print-pass' && ctx.inkById.get(step.params.inkId)?.function === 'conductor') lastPass.set(step.params.inkId, i);
  });
  if (lastPass.size === 0) return [];
  const exposures = heatExposures(ctx.steps);
  const out: ProcessCheck[] = [];
  for (const [inkId, lastIndex] of lastPass) {
    const ink = ctx.inkById.get(inkId) as Ink;
    const lastStep = ctx.steps[lastIndex] as RecipeStep;
    const identity = { id: `cure-dose:ink-${inkId}`, family: 'cure-dose' as const, stepId: lastStep.id, title: `${ink.name} cure dose` };
    out.push(...guarded(identity, () => [judge(ink, lastIndex, lastStep, exposures.filter((h) => h.index > lastIndex))]));
  }
  return out;
}
