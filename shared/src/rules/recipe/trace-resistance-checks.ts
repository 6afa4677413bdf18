import { traceResistanceOhm } from '../../process/electrical';
import { formatNumber as f } from '../../process/units';
import type { Ink } from '../../schemas/material.schema';
import type { ReadingSpec, RecipeStep } from '../../schemas/recipe-step.schema';
import { checkMaker, guarded, stepLabel } from './check-helpers';
import type { ProcessCheck } from './process-check';
import type { RecipeContext } from './recipe-context';

const make = checkMaker('trace-resistance');

/** Ohms per unit for the resistance units a reading spec may use (case matters: mΩ vs MΩ). */
export const OHMS_PER_UNIT: Readonly<Record<string, number>> = {
  'mΩ': 1e-3,
  mohm: 1e-3,
  'Ω': 1,
  ohm: 1,
  ohms: 1,
  Ohm: 1,
  'kΩ': 1e3,
  kohm: 1e3,
  'MΩ': 1e6,
  Mohm: 1e6,
};

/**
 * Whether a value lies inside a spec's limits (a missing limit is open).
 * @example isInsideLimits(3.18, { lowerLimit: 2, upperLimit: 3.19 }) // → true
 */
export function isInsideLimits(value: number, spec: Pick<ReadingSpec, 'lowerLimit' | 'upperLimit'>): boolean {
  return (spec.lowerLimit === null || value >= spec.lowerLimit) && (spec.upperLimit === null || value <= spec.upperLimit);
}

function limitsText(spec: ReadingSpec): string {
  const { lowerLimit: lo, upperLimit: hi, unit } = spec;
  if (lo !== null && hi !== null) return `${f(lo)}–${f(hi)} ${unit}`;
  if (lo !== null) return `≥ ${f(lo)} ${unit}`;
  if (hi !== null) return `≤ ${f(hi)} ${unit}`;
  return 'no limits';
}

function judge(spec: ReadingSpec, step: RecipeStep, index: number, conductors: { ink: Ink; passes: number }[]): ProcessCheck {
  const base = { id: `trace-resistance:${step.id}:${spec.id}`, stepId: step.id, title: `Expected ${spec.name}` };
  const perUnit = OHMS_PER_UNIT[spec.unit.trim()];
  if (perUnit === undefined) {
    return make({ ...base, status: 'warning', numbers: '', why: `Can't compare: “${spec.unit}” is not a resistance unit this check knows; use Ω, mΩ, kΩ or MΩ.` });
  }
  if (conductors.length === 0) {
    return make({ ...base, status: 'warning', numbers: '', why: `No conductive ink is printed by ${stepLabel(index, step)}, so there is no trace to measure yet; move the reading after the conductor's print passes.` });
  }
  const length = spec.traceLengthMm as number;
  const width = spec.traceWidthMm as number;
  const expected = conductors.map(({ ink, passes }) => ({
    ink,
    passes,
    value: ink.sheetResistanceOhmPerSq === null ? null : traceResistanceOhm({ sheetResistanceOhmPerSq: ink.sheetResistanceOhmPerSq, lengthMm: length, widthMm: width, passes }) / perUnit,
  }));
  const figures = expected.map((e) => (e.value === null ? `${e.ink.name}: no sheet resistance on record` : `${e.ink.name} ${f(e.ink.sheetResistanceOhmPerSq ?? 0)} Ω/sq × ${f(length / width)} sq / ${e.passes} pass${e.passes === 1 ? '' : 'es'} = ${f(e.value)} ${spec.unit}`));
  const numbers = `${figures.join('; ')}; spec ${limitsText(spec)} (${f(length)} × ${f(width)} mm trace)`;
  const known = expected.filter((e) => e.value !== null);
  if (known.length === 0) return make({ ...base, status: 'warning', numbers, why: "Can't estimate: record the conductor's sheet resistance per pass." });
  const inside = known.find((e) => isInsideLimits(e.value as number, spec));
  const several = conductors.length > 1 ? ` (${conductors.length} conductors are printed by then; the spec does not say which trace)` : '';
  if (inside) {
    return make({ ...base, status: 'pass', numbers, why: `R = Rs·(L/W)/passes gives ${f(inside.value as number)} ${spec.unit} for ${inside.ink.name} after its reference cure, inside ${limitsText(spec)}${several}.` });
  }
  const first = known[0] as (typeof known)[number];
  return make({ ...base, status: 'warning', numbers, why: `R = Rs·(L/W)/passes gives ${f(first.value as number)} ${spec.unit}, outside ${limitsText(spec)}, so the spec may be unreachable${several}; check the trace size, passes or limits.` });
}

/**
 * For each reading spec with a trace length and width: the resistance the printed conductor
 * should show, R = Rs·(L/W)/passes (sheet resistance per pass after its reference cure; passes in
 * parallel, common practice, no source), beside the spec's limits. Inside → Pass; outside →
 * Warning (the spec may be unreachable). Counts the passes of each conductor printed by that step.
 *
 * @example
 * // 0.0159 Ω/sq, one pass, trace 100 mm × 0.5 mm (200 sq) → 3.18 Ω (REFERENCES §4.4); spec ≤ 5 Ω
 * traceResistanceChecks(ctx) // → [{ id: 'trace-resistance:inspect-1:r-trace', status: 'pass', … }]
 */
export function traceResistanceChecks(ctx: RecipeContext): ProcessCheck[] {
  const out: ProcessCheck[] = [];
  const passes = new Map<number, number>();
  ctx.steps.forEach((step, i) => {
    if (step.kind === 'print-pass' && ctx.inkById.get(step.params.inkId)?.function === 'conductor') {
      passes.set(step.params.inkId, (passes.get(step.params.inkId) ?? 0) + step.params.passes);
    }
    for (const spec of step.readingSpecs) {
      if (spec.traceLengthMm === null || spec.traceWidthMm === null) continue;
      const conductors = [...passes].map(([inkId, n]) => ({ ink: ctx.inkById.get(inkId) as Ink, passes: n }));
      const identity = { id: `trace-resistance:${step.id}:${spec.id}`, family: 'trace-resistance' as const, stepId: step.id, title: `Expected ${spec.name}` };
      out.push(...guarded(identity, () => [judge(spec, step, i, conductors)]));
    }
  });
  return out;
}
