import type { SurfaceComponents } from '../../process/probe-liquids';
import { formatNumber as f } from '../../process/units';
import type { Substrate } from '../../schemas/material.schema';
import type { RecipeStepOf } from '../../schemas/recipe-step.schema';
import { substrateSurfaceEnergy } from '../material-fit';
import { stepLabel } from './check-helpers';
import type { RecipeContext, SubstrateRole } from './recipe-context';

/** The surface a print pass lands on, as the treatments before it left it. */
export interface SurfaceState {
  substrate: Substrate | null;
  role: SubstrateRole;
  /** Total surface free energy, mN/m; null when unknown. */
  totalMilliNPerM: number | null;
  /** Dispersive and polar parts; null when unknown (then no contact angle can be predicted). */
  parts: SurfaceComponents | null;
  /** Where the figure comes from, for the numbers line. */
  basis: string;
  /** The latest treatment before the pass (on this substrate), if any. */
  treatment: { index: number; step: RecipeStepOf<'surface-treatment'> } | null;
  /** True when the parts of a treated surface are estimated (see `treatedState`). */
  arePartsAssumed: boolean;
}

function untreatedState(substrate: Substrate | null, role: SubstrateRole): SurfaceState {
  if (!substrate) return { substrate, role, totalMilliNPerM: null, parts: null, basis: 'no substrate', treatment: null, arePartsAssumed: false };
  const { energy } = substrateSurfaceEnergy(substrate);
  if (!energy) return { substrate, role, totalMilliNPerM: null, parts: null, basis: `${substrate.name}: surface energy not recorded`, treatment: null, arePartsAssumed: false };
  const how = energy.source === 'recorded-parts' ? 'recorded parts' : 'OWRK from its contact angles, Owens & Wendt 1969';
  return {
    substrate,
    role,
    totalMilliNPerM: energy.totalMilliNPerM,
    parts: { dispersiveMilliNPerM: energy.dispersiveMilliNPerM, polarMilliNPerM: energy.polarMilliNPerM },
    basis: `${substrate.name} untreated ${f(energy.totalMilliNPerM)} mN/m (${how})`,
    treatment: null,
    arePartsAssumed: false,
  };
}

/**
 * A treatment with a target surface energy sets the total. Its parts are estimated by keeping the
 * substrate's dispersive part and giving the rest to the polar part, since plasma, corona and
 * UV-ozone mainly add polar groups (common practice, no source). Without a target the untreated
 * figures stand: treatments raise surface energy, so that is the cautious reading.
 */
function treatedState(before: SurfaceState, untreated: SurfaceState, index: number, step: RecipeStepOf<'surface-treatment'>): SurfaceState {
  const treatment = { index, step };
  const target = step.params.targetSurfaceEnergyMilliNPerM;
  if (target === null) return { ...before, treatment };
  const baseDispersive = untreated.parts?.dispersiveMilliNPerM ?? null;
  const parts = baseDispersive !== null && baseDispersive <= target ? { dispersiveMilliNPerM: baseDispersive, polarMilliNPerM: target - baseDispersive } : null;
  return {
    ...before,
    totalMilliNPerM: target,
    parts,
    basis: `treated to ${f(target)} mN/m by ${stepLabel(index, step)}`,
    treatment,
    arePartsAssumed: parts !== null,
  };
}

/**
 * The surface each print pass lands on, keyed by step id: the print substrate as treated by the
 * surface treatments before the pass; after the first transfer, the receiving substrate as
 * treated since.
 *
 * @example
 * // PET 50.4 mN/m (OWRK), then plasma to 62 mN/m, then a print pass 'ag-1'
 * surfaceStates(ctx).get('ag-1') // → { totalMilliNPerM: 62, parts: { dispersive 45.4, polar 16.6 }, arePartsAssumed: true, … }
 */
export function surfaceStates(ctx: RecipeContext): Map<string, SurfaceState> {
  const states = new Map<string, SurfaceState>();
  let untreated = untreatedState(ctx.substrate, 'print-substrate');
  let current = untreated;
  ctx.steps.forEach((step, index) => {
    if (index === ctx.firstTransferIndex) {
      untreated = untreatedState(ctx.receiving, 'receiving-substrate');
      current = untreated;
    } else if (step.kind === 'surface-treatment') {
      current = treatedState(current, untreated, index, step);
    } else if (step.kind === 'print-pass') {
      states.set(step.id, current);
    }
  });
  return states;
}
