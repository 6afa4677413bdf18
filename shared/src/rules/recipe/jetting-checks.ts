import { jettability, minimumEjectionVelocityMetresPerSecond, MIN_EJECTION_WEBER, SPLASH_ONSET_PARAMETER, type JettingVerdict } from '../../process/jettability';
import { DEFAULT_JETTING_WINDOW, JETTING_WINDOWS } from '../../process/jetting-windows';
import { formatNumber as f } from '../../process/units';
import type { Printer } from '../../schemas/equipment.schema';
import type { Ink } from '../../schemas/material.schema';
import { checkMaker, guarded } from './check-helpers';
import type { CheckStatus, ProcessCheck } from './process-check';
import type { RecipeContext } from './recipe-context';

const make = checkMaker('jettability');

/**
 * Verdict to status. Splashing is only a Warning: its criterion is for the drop at impact and we
 * estimate it from the nozzle size and jetting speed. The others stop clean drops forming.
 */
export const JETTING_STATUS: Record<JettingVerdict, CheckStatus> = {
  jettable: 'pass',
  splashing: 'warning',
  'too-viscous': 'blocked',
  satellites: 'blocked',
  'no-ejection': 'blocked',
};

const WINDOW = JETTING_WINDOWS[DEFAULT_JETTING_WINDOW];

function why(verdict: JettingVerdict, ink: Ink, printer: Printer): string {
  const through = `${f(printer.nozzleDiameterUm)} µm nozzle at ${f(printer.jettingSpeedMetresPerSecond)} m/s`;
  switch (verdict) {
    case 'jettable':
      return `${ink.name} should form clean drops through the ${through}: Z is inside ${WINDOW.label} (${WINDOW.source}).`;
    case 'splashing':
      return `Drops may splash where they land (We^½·Re^¼ above ${SPLASH_ONSET_PARAMETER}, Stow & Hadfield 1981 as restated by Derby 2010); it is an estimate from the ${through}, so print a test pattern first.`;
    case 'too-viscous':
      return `${ink.name} is too thick for the ${through}: with Z below ${WINDOW.zMin} viscous losses stop drops forming (${WINDOW.source}).`;
    case 'satellites':
      return `${ink.name} is too runny for the ${through}: with Z above ${WINDOW.zMax} the jet breaks into stray satellite drops (${WINDOW.source}).`;
    case 'no-ejection': {
      const vMin = minimumEjectionVelocityMetresPerSecond({ surfaceTensionMilliNPerM: ink.surfaceTensionMilliNPerM, densityKgPerM3: ink.densityKgPerM3, nozzleDiameterUm: printer.nozzleDiameterUm });
      return `At ${f(printer.jettingSpeedMetresPerSecond)} m/s surface tension holds ${ink.name} in the nozzle: We must exceed ${MIN_EJECTION_WEBER} (Duineveld et al. 2002), so jet faster than ${f(vMin)} m/s.`;
    }
  }
}

/**
 * Each print pass's ink through the version printer's nozzle at its jetting speed, in the
 * printable window 1 < Z < 10 (Reis & Derby 2000), with We > 4 and the splash estimate.
 *
 * @example
 * // 50 wt % glycerol–water (6.00 mPa·s, 70 mN/m, 1126 kg/m³), 21 µm nozzle, 6 m/s
 * jettingChecks(ctx)
 * // → [{ id: 'jettability:print-1', status: 'pass', numbers: 'Z = 6.78 (window 1 < Z < 10), We = 12.2 (needs > 4), We^½·Re^¼ = 7.69 (splashes above 50); 21 µm nozzle at 6 m/s', … }]
 */
export function jettingChecks(ctx: RecipeContext): ProcessCheck[] {
  const { printer } = ctx;
  if (!printer) return [];
  const out: ProcessCheck[] = [];
  for (const step of ctx.steps) {
    if (step.kind !== 'print-pass') continue;
    const ink = ctx.inkById.get(step.params.inkId);
    if (!ink) continue;
    const identity = { id: `jettability:${step.id}`, family: 'jettability' as const, stepId: step.id, title: `Jetting ${ink.name}` };
    out.push(
      ...guarded(identity, () => {
        const r = jettability({
          viscosityMilliPaS: ink.viscosityMilliPaS,
          surfaceTensionMilliNPerM: ink.surfaceTensionMilliNPerM,
          densityKgPerM3: ink.densityKgPerM3,
          nozzleDiameterUm: printer.nozzleDiameterUm,
          dropVelocityMetresPerSecond: printer.jettingSpeedMetresPerSecond,
        });
        const numbers =
          `Z = ${f(r.z)} (window ${WINDOW.label}), We = ${f(r.weber ?? Number.NaN)} (needs > ${MIN_EJECTION_WEBER}), ` +
          `We^½·Re^¼ = ${f(r.splashParameter ?? Number.NaN)} (splashes above ${SPLASH_ONSET_PARAMETER}); ` +
          `${f(printer.nozzleDiameterUm)} µm nozzle at ${f(printer.jettingSpeedMetresPerSecond)} m/s`;
        return [make({ ...identity, status: JETTING_STATUS[r.verdict], numbers, why: why(r.verdict, ink, printer) })];
      }),
    );
  }
  return out;
}
