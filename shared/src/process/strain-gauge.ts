import { fieldLabel } from './field-labels';
import { requireFinite, requireMinLength, requirePositive } from './input-guards';
import { ProcessInputError } from './process-input-error';

/**
 * Resistance of a stretched incompressible conductor with constant resistivity:
 * R = R₀(1 + ε)² (length × (1 + ε), cross-section ÷ (1 + ε)). Strain is a fraction (0.3 = 30 %).
 *
 * @example stretchedResistanceOhm({ unstrainedOhm: 10, strain: 0.5 }) // → 22.5 (R/R₀ = 2.25)
 */
export function stretchedResistanceOhm(input: { unstrainedOhm: number; strain: number }): number {
  const r0 = requirePositive('unstrainedOhm', input.unstrainedOhm);
  return r0 * (1 + requireStrain('strain', input.strain)) ** 2;
}

export interface StrainPoint {
  strain: number;
  ohm: number;
}

export interface GaugeFactorFit {
  gaugeFactor: number;
  unstrainedOhm: number;
  /** 'measured': mean of the readings at strain 0; 'fit-intercept': R at ε = 0 from the line fit. */
  unstrainedOhmFrom: 'measured' | 'fit-intercept';
}

/**
 * Gauge factor GF = (ΔR/R₀)/ε as the least-squares slope of ΔR/R₀ against strain.
 * R₀ choice: the reading at strain 0 when there is one (the mean if there are several), because a
 * measured baseline is what a lab reports; otherwise the intercept of a straight-line fit of R
 * against ε, which gives the same slope as fitting ΔR/R₀ with that R₀. Both fits are ordinary
 * least squares with a free intercept, so one noisy zero reading does not pin the line.
 *
 * @example
 * // (0, 10 Ω) and (0.5, 22.5 Ω): ΔR/R₀ = 1.25 at ε = 0.5 → { gaugeFactor: 2.5, unstrainedOhm: 10, unstrainedOhmFrom: 'measured' }
 * gaugeFactorFit([{ strain: 0, ohm: 10 }, { strain: 0.5, ohm: 22.5 }])
 */
export function gaugeFactorFit(points: readonly StrainPoint[]): GaugeFactorFit {
  requireMinLength('points', points, 2);
  points.forEach((p, i) => {
    requireStrain(`points[${i}].strain`, p.strain);
    requirePositive(`points[${i}].ohm`, p.ohm);
  });
  const strains = points.map((p) => p.strain);
  const atZero = points.filter((p) => p.strain === 0);
  if (atZero.length > 0) {
    const unstrainedOhm = atZero.reduce((sum, p) => sum + p.ohm, 0) / atZero.length;
    const relative = points.map((p) => p.ohm / unstrainedOhm - 1);
    const { slope } = fitLine(strains, relative);
    return { gaugeFactor: slope, unstrainedOhm, unstrainedOhmFrom: 'measured' };
  }
  const { slope, intercept } = fitLine(
    strains,
    points.map((p) => p.ohm),
  );
  if (intercept <= 0) {
    throw new ProcessInputError(
      'points',
      `The fitted resistance at zero strain is ${intercept} Ω; add a reading at strain 0.`,
    );
  }
  return {
    gaugeFactor: slope / intercept,
    unstrainedOhm: intercept,
    unstrainedOhmFrom: 'fit-intercept',
  };
}

/**
 * Gauge factor only; see gaugeFactorFit for how R₀ is chosen.
 * @example gaugeFactor([{ strain: 0, ohm: 10 }, { strain: 0.1, ohm: 12.1 }]) // → 2.1
 */
export function gaugeFactor(points: readonly StrainPoint[]): number {
  return gaugeFactorFit(points).gaugeFactor;
}

function requireStrain(field: string, strain: number): number {
  requireFinite(field, strain);
  // ε ≤ −1 would shrink the conductor to zero length or less.
  if (strain <= -1) {
    throw new ProcessInputError(
      field,
      `${fieldLabel(field)} must be above -1 (a fraction, 0.3 = 30 %); got ${strain}.`,
    );
  }
  return strain;
}

// Ordinary least squares y = intercept + slope·x.
function fitLine(
  xs: readonly number[],
  ys: readonly number[],
): { slope: number; intercept: number } {
  const n = xs.length;
  const meanX = xs.reduce((a, b) => a + b, 0) / n;
  const meanY = ys.reduce((a, b) => a + b, 0) / n;
  let sxy = 0;
  let sxx = 0;
  xs.forEach((x, i) => {
    sxy += (x - meanX) * ((ys[i] as number) - meanY);
    sxx += (x - meanX) ** 2;
  });
  if (sxx === 0) {
    throw new ProcessInputError(
      'points',
      'The points need at least two different strains to fit a slope.',
    );
  }
  const slope = sxy / sxx;
  return { slope, intercept: meanY - slope * meanX };
}
