import { GAS_CONSTANT_J_PER_MOL_K } from './constants';
import {
  optionalCelsiusThreshold,
  requireCelsius,
  requireMinLength,
  requireNonNegative,
  requirePositive,
} from './input-guards';
import { ProcessInputError } from './process-input-error';
import { celsiusToKelvin } from './units';

export interface ArrheniusConditions {
  referenceTempC: number;
  activationEnergyKJPerMol: number;
}

/**
 * Rate at T relative to the rate at T_ref: exp(−Ea/R·(1/T − 1/T_ref)), T in kelvin.
 *
 * @example
 * arrheniusAccelerationFactor({ tempC: 120, referenceTempC: 150, activationEnergyKJPerMol: 80 }) // → 0.17638
 */
export function arrheniusAccelerationFactor(
  input: ArrheniusConditions & { tempC: number },
): number {
  // kelvin here: Arrhenius needs absolute temperature.
  const t = celsiusToKelvin(requireCelsius('tempC', input.tempC));
  const tRef = celsiusToKelvin(requireCelsius('referenceTempC', input.referenceTempC));
  const ea = requireNonNegative('activationEnergyKJPerMol', input.activationEnergyKJPerMol) * 1000;
  return Math.exp((-ea / GAS_CONSTANT_J_PER_MOL_K) * (1 / t - 1 / tRef));
}

/**
 * Minutes at the reference temperature equivalent to a hold: t·exp(−Ea/R·(1/T − 1/T_ref)).
 * Assumes one activation energy governs the whole cure (isoconversion).
 *
 * @example
 * // 30 min at 120 °C with Ea = 80 kJ/mol → 5.291 min at 150 °C
 * arrheniusEquivalentMinutes({ minutes: 30, atTempC: 120, referenceTempC: 150, activationEnergyKJPerMol: 80 })
 */
export function arrheniusEquivalentMinutes(
  input: ArrheniusConditions & { minutes: number; atTempC: number },
): number {
  const minutes = requireNonNegative('minutes', input.minutes);
  return minutes * arrheniusAccelerationFactor({ ...input, tempC: input.atTempC });
}

/**
 * Equivalent minutes at the reference temperature of step-wise holds (instant changes between
 * holds). Holds below `minEffectiveTempC` count nothing.
 *
 * @example
 * // 10 min @100 °C + 20 min @130 °C + 10 min @150 °C, Ea = 80 kJ/mol, ref 150 °C → 16.948 min
 * holdsEquivalentMinutes({ holds: [{ minutes: 10, tempC: 100 }, { minutes: 20, tempC: 130 }, { minutes: 10, tempC: 150 }],
 *   referenceTempC: 150, activationEnergyKJPerMol: 80 })
 */
export function holdsEquivalentMinutes(
  input: ArrheniusConditions & {
    holds: readonly { minutes: number; tempC: number }[];
    minEffectiveTempC?: number;
  },
): number {
  requireMinLength('holds', input.holds, 1);
  const threshold = optionalCelsiusThreshold('minEffectiveTempC', input.minEffectiveTempC);
  return input.holds.reduce((sum, hold, i) => {
    requireNonNegative(`holds[${i}].minutes`, hold.minutes);
    requireCelsius(`holds[${i}].tempC`, hold.tempC);
    if (hold.tempC < threshold) return sum;
    return (
      sum + arrheniusEquivalentMinutes({ ...input, minutes: hold.minutes, atTempC: hold.tempC })
    );
  }, 0);
}

/**
 * Activation energy implied by a rate ratio between two temperatures: Ea = R·ln(ratio)/(1/T₁ − 1/T₂).
 *
 * @example
 * // "rate doubles per +10 °C" between 20 and 30 °C → 51.22 kJ/mol
 * activationEnergyFromRateRatioKJPerMol({ lowTempC: 20, highTempC: 30, rateRatio: 2 })
 */
export function activationEnergyFromRateRatioKJPerMol(input: {
  lowTempC: number;
  highTempC: number;
  rateRatio: number;
}): number {
  const t1 = celsiusToKelvin(requireCelsius('lowTempC', input.lowTempC));
  const t2 = celsiusToKelvin(requireCelsius('highTempC', input.highTempC));
  if (t2 <= t1) {
    throw new ProcessInputError(
      'highTempC',
      `The high temperature must be above the low one; got ${input.highTempC} °C ≤ ${input.lowTempC} °C.`,
    );
  }
  const ratio = requirePositive('rateRatio', input.rateRatio);
  return (GAS_CONSTANT_J_PER_MOL_K * Math.log(ratio)) / (1 / t1 - 1 / t2) / 1000;
}
