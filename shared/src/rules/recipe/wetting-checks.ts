import { formatNumber as f } from '../../process/units';
import { DEFAULT_WETTING_MARGIN_MILLI_N_PER_M } from '../../process/wetting-margin';
import { checkMaker, stepLabel } from './check-helpers';
import type { CheckStatus, ProcessCheck } from './process-check';
import type { RecipeContext } from './recipe-context';
import { surfaceStates, type SurfaceState } from './surface-state';

const make = checkMaker('wetting');

/**
 * Surface energy should beat the ink's surface tension by about 10 mN/m: common practice, no
 * source (an industrial-practice page asks for roughly 8–10 mN/m, REFERENCES §2.4).
 */
export const WETTING_PASS_MARGIN_MILLI_N_PER_M = DEFAULT_WETTING_MARGIN_MILLI_N_PER_M;

/** Below this margin the ink's surface tension exceeds the surface's energy: it beads up. */
export const WETTING_BLOCK_BELOW_MILLI_N_PER_M = 0;

/**
 * Margin to status: ≥ 10 mN/m Pass, 0 to under 10 Warning, negative Blocked.
 * @example wettingStatus(9.99) // → 'warning'
 */
export function wettingStatus(marginMilliNPerM: number): CheckStatus {
  if (marginMilliNPerM >= WETTING_PASS_MARGIN_MILLI_N_PER_M) return 'pass';
  return marginMilliNPerM >= WETTING_BLOCK_BELOW_MILLI_N_PER_M ? 'warning' : 'blocked';
}

/**
 * The shop-floor check a treatment's target water contact angle asks for, as a numbers suffix.
 * @example floorCheckText(stateAfterPlasma) // → '; floor check: water contact angle ≤ 40° after step 2 “Plasma”' ('' when none is set)
 */
export function floorCheckText(state: SurfaceState): string {
  const angle = state.treatment?.step.params.targetWaterContactAngleDeg ?? null;
  if (!state.treatment || angle === null) return '';
  return `; floor check: water contact angle ≤ ${f(angle)}° after ${stepLabel(state.treatment.index, state.treatment.step)}`;
}

function why(status: CheckStatus, margin: number, inkName: string): string {
  const m = `${f(margin)} mN/m`;
  const asked = `${WETTING_PASS_MARGIN_MILLI_N_PER_M} mN/m common practice asks for`;
  if (status === 'pass') return `The surface's energy beats ${inkName}'s surface tension by ${m}, at least the ${asked}, so the ink should spread and hold.`;
  if (status === 'warning') return `The surface's energy beats ${inkName}'s surface tension by only ${m}, under the ${asked}: the ink may pull back into beads, so treat the surface harder or test first.`;
  return `${inkName}'s surface tension is higher than the surface's energy (margin ${m}), so it will bead up instead of wetting; treat the surface or change the ink.`;
}

/**
 * Each print pass's ink on the surface it lands on, as treated by the steps before it: margin =
 * surface energy − ink surface tension, judged against 10 mN/m (common practice, no source).
 *
 * @example
 * // PET with water 72.5°, diiodomethane 27° → 50.36 mN/m by OWRK (Owens & Wendt 1969); ink 28 mN/m
 * wettingChecks(ctx) // → [{ id: 'wetting:print-1', status: 'pass', numbers: 'surface 50.4 − ink 28 = margin 22.4 mN/m (Pass at ≥ 10); …', … }]
 */
export function wettingChecks(ctx: RecipeContext, states: ReadonlyMap<string, SurfaceState> = surfaceStates(ctx)): ProcessCheck[] {
  const out: ProcessCheck[] = [];
  for (const step of ctx.steps) {
    if (step.kind !== 'print-pass') continue;
    const ink = ctx.inkById.get(step.params.inkId);
    const state = states.get(step.id);
    if (!ink || !state?.substrate) continue;
    const base = { id: `wetting:${step.id}`, stepId: step.id, title: `${ink.name} wetting ${state.substrate.name}` };
    const surface = state.totalMilliNPerM;
    if (surface === null) {
      const numbers = `ink ${f(ink.surfaceTensionMilliNPerM)} mN/m; ${state.basis}${floorCheckText(state)}`;
      out.push(make({ ...base, status: 'warning', numbers, why: `Can't check wetting: ${state.substrate.name} has no surface energy on record; enter its parts or its water and diiodomethane contact angles, or give the treatment a target surface energy.` }));
      continue;
    }
    const margin = surface - ink.surfaceTensionMilliNPerM;
    const status = wettingStatus(margin);
    const numbers =
      `surface ${f(surface)} − ink ${f(ink.surfaceTensionMilliNPerM)} = margin ${f(margin)} mN/m ` +
      `(Pass at ≥ ${WETTING_PASS_MARGIN_MILLI_N_PER_M}); ${state.basis}${floorCheckText(state)}`;
    out.push(make({ ...base, status, numbers, why: why(status, margin, ink.name) }));
  }
  return out;
}
