import { beadWidthUm, dropSpacingUm, equilibriumFootprintUm } from '../../process/line-geometry';
import { formatNumber as f } from '../../process/units';
import { predictedContactAngleDeg } from '../../process/wetting';
import type { Printer } from '../../schemas/equipment.schema';
import type { Ink } from '../../schemas/material.schema';
import type { RecipeStepOf } from '../../schemas/recipe-step.schema';
import { checkMaker, guarded } from './check-helpers';
import type { ProcessCheck } from './process-check';
import type { RecipeContext } from './recipe-context';
import { surfaceStates, type SurfaceState } from './surface-state';

const make = checkMaker('line-continuity');

const CITE = 'Stringer & Derby 2010';

function judge(step: RecipeStepOf<'print-pass'>, ink: Ink, printer: Printer, state: SurfaceState): ProcessCheck {
  const base = { id: `line-continuity:${step.id}`, stepId: step.id, title: `${ink.name} line at ${f(step.params.dpi)} dpi` };
  const spacing = dropSpacingUm(step.params.dpi);
  const spacingText = `drop spacing ${f(spacing)} µm (${f(step.params.dpi)} dpi)`;
  const inkD = ink.surfaceTensionDispersiveMilliNPerM;
  const inkP = ink.surfaceTensionPolarMilliNPerM;
  if (inkD === null || inkP === null || state.parts === null) {
    const missing = inkD === null || inkP === null ? `${ink.name}'s dispersive and polar parts` : `the parts of the surface's energy (${state.basis})`;
    return make({ ...base, status: 'warning', numbers: spacingText, why: `Can't predict the contact angle without ${missing}, so whether the drops join into a line is unchecked; print a test line.` });
  }
  const theta = predictedContactAngleDeg({ liquid: { dispersiveMilliNPerM: inkD, polarMilliNPerM: inkP }, solid: state.parts });
  const assumed = state.arePartsAssumed ? ' (treated surface: parts estimated)' : '';
  const angleText = `θ ${f(theta)}° by OWRK${assumed}`;
  if (theta <= 0) {
    return make({ ...base, status: 'pass', numbers: `${spacingText}; ${angleText}: the ink spreads fully`, why: `${ink.name} spreads fully on this surface, so the drops run together; the line may come out wider than drawn.` });
  }
  if (theta >= 180) {
    return make({ ...base, status: 'blocked', numbers: `${spacingText}; ${angleText}`, why: `${ink.name} does not wet this surface at all, so drops stay separate beads; treat the surface or change the ink.` });
  }
  const footprint = equilibriumFootprintUm({ dropVolumePl: printer.dropVolumePl, contactAngleDeg: theta });
  const footprintText = `${spacingText} vs drop footprint ${f(footprint)} µm (${f(printer.dropVolumePl)} pL, ${angleText})`;
  if (spacing >= footprint) {
    const dpiNeeded = dropSpacingUm(footprint);
    return make({ ...base, status: 'blocked', numbers: footprintText, why: `Drops stay separate beads: they land ${f(spacing)} µm apart but each spreads only ${f(footprint)} µm wide, so print above ${f(dpiNeeded)} dpi or improve wetting.` });
  }
  const width = beadWidthUm({ dropVolumePl: printer.dropVolumePl, dropSpacingUm: spacing, contactAngleDeg: theta });
  return make({
    ...base,
    status: 'pass',
    numbers: `${footprintText}; expected line width ${f(width)} µm (${CITE})`,
    why: `Drops ${f(spacing)} µm apart overlap their ${f(footprint)} µm footprints, so they join into a line about ${f(width)} µm wide (${CITE}).`,
  });
}

/**
 * Whether each print pass's drops join into a continuous line: drop spacing (25 400 µm / dpi)
 * must be below the footprint of one spread drop (spherical cap at the OWRK contact angle of the
 * ink on the treated surface). The expected line width is the stable bead width of Stringer &
 * Derby 2010. An unpredictable angle is a Warning.
 *
 * @example
 * // 14.137 pL drops (d₀ 30 µm) at 1016 dpi (25 µm) with θ = 30° → footprint 64.0 µm, width 79.0 µm
 * lineContinuityChecks(ctx) // → [{ id: 'line-continuity:print-1', status: 'pass', … }]
 */
export function lineContinuityChecks(ctx: RecipeContext, states: ReadonlyMap<string, SurfaceState> = surfaceStates(ctx)): ProcessCheck[] {
  const { printer } = ctx;
  if (!printer) return [];
  const out: ProcessCheck[] = [];
  for (const step of ctx.steps) {
    if (step.kind !== 'print-pass') continue;
    const ink = ctx.inkById.get(step.params.inkId);
    const state = states.get(step.id);
    if (!ink || !state?.substrate) continue;
    const identity = { id: `line-continuity:${step.id}`, family: 'line-continuity' as const, stepId: step.id, title: `${ink.name} line` };
    out.push(...guarded(identity, () => [judge(step, ink, printer, state)]));
  }
  return out;
}
