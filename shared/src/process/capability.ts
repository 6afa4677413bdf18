import { D2_MOVING_RANGE_OF_TWO } from './constants';
import { requireFinite, requireMinLength } from './input-guards';
import { ProcessInputError } from './process-input-error';

export interface SpecLimits {
  lsl?: number;
  usl?: number;
}

export interface Capability {
  n: number;
  mean: number;
  /** MR̄ / 1.128: short-term spread, used by Cp and Cpk. */
  sigmaWithin: number;
  /** Sample standard deviation (n − 1): long-term spread, used by Pp and Ppk. */
  sigmaOverall: number;
  /** null with a one-sided specification. */
  cp: number | null;
  cpk: number;
  pp: number | null;
  ppk: number;
}

/**
 * Process capability (Montgomery): Cp = (USL − LSL)/6σ, Cpk = min(USL − μ, μ − LSL)/3σ with the
 * within-subgroup σ (MR̄/1.128, individuals in time order); Pp/Ppk the same with the overall
 * sample σ. With one limit, Cp and Pp are null and Cpk/Ppk are the one-sided index.
 *
 * @example
 * capability([52, 55, 51, 54, 53, 56, 52, 50, 54, 53], { lsl: 44, usl: 60 })
 * // → { n: 10, mean: 53, sigmaWithin: 2.4626, sigmaOverall: 1.8257, cp: 1.0829, cpk: 0.9475, pp: 1.4606, ppk: 1.2780 }
 */
export function capability(values: readonly number[], limits: SpecLimits): Capability {
  requireMinLength('values', values, 2);
  values.forEach((x, i) => requireFinite(`values[${i}]`, x));
  const { lsl, usl } = checkLimits(limits);

  const n = values.length;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const mrSum = values.slice(1).reduce((sum, x, i) => sum + Math.abs(x - (values[i] as number)), 0);
  const sigmaWithin = mrSum / (n - 1) / D2_MOVING_RANGE_OF_TWO;
  const sigmaOverall = Math.sqrt(values.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1));
  if (sigmaWithin === 0 || sigmaOverall === 0) {
    throw new ProcessInputError(
      'values',
      'The values do not vary, so capability indices are undefined.',
    );
  }

  const spread = (sigma: number) =>
    lsl !== undefined && usl !== undefined ? (usl - lsl) / (6 * sigma) : null;
  const nearest = (sigma: number) =>
    Math.min(
      usl !== undefined ? (usl - mean) / (3 * sigma) : Number.POSITIVE_INFINITY,
      lsl !== undefined ? (mean - lsl) / (3 * sigma) : Number.POSITIVE_INFINITY,
    );
  return {
    n,
    mean,
    sigmaWithin,
    sigmaOverall,
    cp: spread(sigmaWithin),
    cpk: nearest(sigmaWithin),
    pp: spread(sigmaOverall),
    ppk: nearest(sigmaOverall),
  };
}

function checkLimits(limits: SpecLimits): SpecLimits {
  const lsl = limits?.lsl === undefined ? undefined : requireFinite('lsl', limits.lsl);
  const usl = limits?.usl === undefined ? undefined : requireFinite('usl', limits.usl);
  if (lsl === undefined && usl === undefined) {
    throw new ProcessInputError(
      'limits',
      'Capability needs at least one specification limit (lower or upper).',
    );
  }
  if (lsl !== undefined && usl !== undefined && lsl >= usl) {
    throw new ProcessInputError('usl', `The upper limit must be above the lower limit; got lower ${lsl}, upper ${usl}.`);
  }
  return { lsl, usl };
}
