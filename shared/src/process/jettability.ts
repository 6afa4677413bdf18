import { requirePositive } from './input-guards';
import {
  DEFAULT_JETTING_WINDOW,
  jettingWindow,
  zWindowPosition,
  type JettingWindowId,
} from './jetting-windows';
import { formatNumber as f } from './units';

/** We must exceed this for a drop to leave the nozzle (Duineveld et al. 2002, as cited by Derby 2010). */
export const MIN_EJECTION_WEBER = 4;

/** Splash onset K = We^½·Re^¼ > 50 (Derby 2010's restatement of Stow & Hadfield 1981). */
export const SPLASH_ONSET_PARAMETER = 50;

export interface JettabilityInput {
  viscosityMilliPaS: number;
  surfaceTensionMilliNPerM: number;
  densityKgPerM3: number;
  nozzleDiameterUm: number;
  /** Jetting speed; leave out (or null) when unknown and only Z is judged. */
  dropVelocityMetresPerSecond?: number | null;
  window?: JettingWindowId;
}

export type JettingVerdict =
  'too-viscous' | 'satellites' | 'no-ejection' | 'splashing' | 'jettable';

export interface JettabilityResult {
  ohnesorge: number;
  z: number;
  /** null when no jetting speed was given. */
  reynolds: number | null;
  weber: number | null;
  /** K = We^½·Re^¼; null when no jetting speed was given. */
  splashParameter: number | null;
  verdict: JettingVerdict;
  reasons: string[];
}

/**
 * Ohnesorge, Z, Reynolds, Weber and splash numbers of an ink through a nozzle, and a verdict.
 * Length is the nozzle diameter throughout; SI inside (mPa·s → Pa·s, mN/m → N/m, µm → m).
 *
 * @example
 * // 50 wt % glycerol–water at 20 °C through 21 µm at 6 m/s:
 * jettability({ viscosityMilliPaS: 6.0, surfaceTensionMilliNPerM: 70, densityKgPerM3: 1126,
 *   nozzleDiameterUm: 21, dropVelocityMetresPerSecond: 6 })
 * // → { ohnesorge: 0.1475, z: 6.782, reynolds: 23.65, weber: 12.16, splashParameter: 7.691,
 * //      verdict: 'jettable', reasons: ['Z = 6.78 is inside the printable window 1 < Z < 10 (Reis & Derby 2000).', …] }
 */
export function jettability(input: JettabilityInput): JettabilityResult {
  const eta = requirePositive('viscosityMilliPaS', input.viscosityMilliPaS) * 1e-3;
  const gamma = requirePositive('surfaceTensionMilliNPerM', input.surfaceTensionMilliNPerM) * 1e-3;
  const rho = requirePositive('densityKgPerM3', input.densityKgPerM3);
  const length = requirePositive('nozzleDiameterUm', input.nozzleDiameterUm) * 1e-6;
  const windowId = jettingWindow(input.window ?? DEFAULT_JETTING_WINDOW).id;
  const v = input.dropVelocityMetresPerSecond;

  const ohnesorge = eta / Math.sqrt(rho * gamma * length);
  const z = 1 / ohnesorge;
  let reynolds: number | null = null;
  let weber: number | null = null;
  let splashParameter: number | null = null;
  if (v !== undefined && v !== null) {
    requirePositive('dropVelocityMetresPerSecond', v);
    reynolds = (rho * v * length) / eta;
    weber = (rho * v * v * length) / gamma;
    splashParameter = Math.sqrt(weber) * Math.pow(reynolds, 0.25);
  }

  const reasons = [windowReason(z, windowId)];
  if (weber === null || splashParameter === null) {
    reasons.push('No jetting speed given: Re, We and the splashing estimate need one.');
  } else {
    reasons.push(ejectionReason(weber, gamma, rho, length), splashReason(splashParameter));
  }
  const verdict = pickVerdict(z, windowId, weber, splashParameter);
  return { ohnesorge, z, reynolds, weber, splashParameter, verdict, reasons };
}

/**
 * Slowest jetting speed with We > 4 at the nozzle: v = √(4γ / (ρ d)).
 * @example
 * // water at 20 °C (72.74 mN/m, 998.2 kg/m³) through 21 µm → 3.726 m/s
 * minimumEjectionVelocityMetresPerSecond({ surfaceTensionMilliNPerM: 72.74, densityKgPerM3: 998.2, nozzleDiameterUm: 21 })
 */
export function minimumEjectionVelocityMetresPerSecond(input: {
  surfaceTensionMilliNPerM: number;
  densityKgPerM3: number;
  nozzleDiameterUm: number;
}): number {
  const gamma = requirePositive('surfaceTensionMilliNPerM', input.surfaceTensionMilliNPerM) * 1e-3;
  const rho = requirePositive('densityKgPerM3', input.densityKgPerM3);
  const length = requirePositive('nozzleDiameterUm', input.nozzleDiameterUm) * 1e-6;
  return Math.sqrt((MIN_EJECTION_WEBER * gamma) / (rho * length));
}

// Order matters: a fluid that cannot form drops is reported as such before speed-related issues.
function pickVerdict(
  z: number,
  windowId: JettingWindowId,
  weber: number | null,
  splashParameter: number | null,
): JettingVerdict {
  const position = zWindowPosition(z, windowId);
  if (position === 'below') return 'too-viscous';
  if (position === 'above') return 'satellites';
  if (weber !== null && weber <= MIN_EJECTION_WEBER) return 'no-ejection';
  if (splashParameter !== null && splashParameter > SPLASH_ONSET_PARAMETER) return 'splashing';
  return 'jettable';
}

function windowReason(z: number, windowId: JettingWindowId): string {
  const w = jettingWindow(windowId);
  const cite =
    windowId === 'jang-kim-moon' ? `${w.source}; its length convention is unconfirmed` : w.source;
  const where = `the printable window ${w.label} (${cite})`;
  switch (zWindowPosition(z, windowId)) {
    case 'below':
      return `Z = ${f(z)} is below ${where}: viscous dissipation stops drops from forming.`;
    case 'above':
      return `Z = ${f(z)} is above ${where}: expect satellite drops.`;
    default:
      return `Z = ${f(z)} is inside ${where}.`;
  }
}

function ejectionReason(weber: number, gamma: number, rho: number, length: number): string {
  const cite = '(Duineveld et al. 2002, as cited by Derby 2010)';
  if (weber > MIN_EJECTION_WEBER) {
    return `We = ${f(weber)} > ${MIN_EJECTION_WEBER}: inertia overcomes surface tension at the nozzle, so drops can be ejected ${cite}.`;
  }
  const vMin = Math.sqrt((MIN_EJECTION_WEBER * gamma) / (rho * length));
  return `We = ${f(weber)} ≤ ${MIN_EJECTION_WEBER}: surface tension holds the ink in the nozzle; jet faster than ${f(vMin)} m/s ${cite}.`;
}

function splashReason(k: number): string {
  const cite = '(Stow & Hadfield 1981, as restated by Derby 2010)';
  const caveat =
    'This is an estimate: the criterion is for the drop at impact, and here it uses the nozzle diameter and jetting speed.';
  if (k > SPLASH_ONSET_PARAMETER) {
    return `We^½·Re^¼ = ${f(k)} > ${SPLASH_ONSET_PARAMETER}: drops are likely to splash on impact ${cite}. ${caveat}`;
  }
  return `We^½·Re^¼ = ${f(k)} ≤ ${SPLASH_ONSET_PARAMETER}: no splashing expected on impact ${cite}. ${caveat}`;
}
