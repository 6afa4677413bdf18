import { D2_MOVING_RANGE_OF_TWO, D4_MOVING_RANGE_OF_TWO } from './constants';
import { requireFinite, requireMinLength, requirePositive } from './input-guards';
import { westernElectricSignals, type RunRuleSignal } from './run-rules';

export interface IndividualsChart {
  mean: number;
  movingRanges: number[];
  movingRangeMean: number;
  sigma: number;
  ucl: number;
  lcl: number;
  movingRangeUcl: number;
  signals: RunRuleSignal[];
}

/** Limits frozen from a baseline period. */
export interface FrozenLimits {
  mean: number;
  sigma: number;
}

/**
 * Individuals and moving-range (I-MR) chart, n = 2: σ̂ = MR̄/d₂ (d₂ = 1.128), limits mean ± 3σ̂,
 * MR chart UCL = D₄·MR̄ (D₄ = 3.267, LCL 0), plus Western Electric run-rule signals.
 *
 * With `frozen` limits (from a baseline), the centre line, σ and both charts' limits come from the
 * baseline: movingRangeMean is then the baseline's MR̄ = d₂·σ. Moving ranges are always those of
 * `values`. Without frozen limits at least two values are needed.
 *
 * @example
 * individualsChart([52, 55, 51, 54, 53, 56, 52, 50, 54, 53])
 * // → { mean: 53, movingRanges: [3, 4, 3, 1, 3, 4, 2, 4, 1], movingRangeMean: 2.7778, sigma: 2.4626,
 * //      ucl: 60.388, lcl: 45.612, movingRangeUcl: 9.075, signals: [] }
 */
export function individualsChart(
  values: readonly number[],
  frozen?: FrozenLimits,
): IndividualsChart {
  requireMinLength('values', values, frozen ? 1 : 2);
  values.forEach((x, i) => requireFinite(`values[${i}]`, x));
  const movingRanges = values.slice(1).map((x, i) => Math.abs(x - (values[i] as number)));

  let mean: number;
  let sigma: number;
  if (frozen) {
    mean = requireFinite('frozen.mean', frozen.mean);
    sigma = requirePositive('frozen.sigma', frozen.sigma);
  } else {
    mean = average(values);
    sigma = average(movingRanges) / D2_MOVING_RANGE_OF_TWO;
  }
  const movingRangeMean = frozen ? sigma * D2_MOVING_RANGE_OF_TWO : average(movingRanges);
  return {
    mean,
    movingRanges,
    movingRangeMean,
    sigma,
    ucl: mean + 3 * sigma,
    lcl: mean - 3 * sigma,
    movingRangeUcl: D4_MOVING_RANGE_OF_TWO * movingRangeMean,
    signals: westernElectricSignals(values, mean, sigma),
  };
}

function average(xs: readonly number[]): number {
  return xs.reduce((a, b) => a + b, 0) / xs.length;
}
