import {
  optionalCelsiusThreshold,
  requireCelsius,
  requireFinite,
  requireMinLength,
} from './input-guards';
import { ProcessInputError } from './process-input-error';
import { arrheniusAccelerationFactor, type ArrheniusConditions } from './thermal';

export interface TemperatureSample {
  minute: number;
  tempC: number;
}

/**
 * Cure dose of a logged temperature profile: equivalent minutes at the reference temperature,
 * by the trapezoidal rule over the Arrhenius factor exp(−Ea/R·(1/T − 1/T_ref)).
 *
 * Threshold rule: a sample below `minEffectiveTempC` has factor 0, and each trapezoid interpolates
 * between its two ends. So time with both ends cold adds nothing (a long bake far too cold never
 * sums to a cure), and an interval crossing the threshold adds half of its warm end's share.
 * Samples must be in strictly increasing minute order. One sample spans no time: dose 0.
 * The factor is convex in temperature for any realistic activation energy (Ea/RT > 2), so
 * trapezoids over-count slightly during ramps; log more often to shrink that.
 *
 * @example
 * // held at 120 °C from minute 0 to 30, Ea = 80 kJ/mol → 5.291 min at 150 °C
 * cureDoseMinutes({ samples: [{ minute: 0, tempC: 120 }, { minute: 30, tempC: 120 }],
 *   referenceTempC: 150, activationEnergyKJPerMol: 80 })
 */
export function cureDoseMinutes(
  input: ArrheniusConditions & {
    samples: readonly TemperatureSample[];
    minEffectiveTempC?: number;
  },
): number {
  const samples = requireMinLength('samples', input.samples, 1);
  const threshold = optionalCelsiusThreshold('minEffectiveTempC', input.minEffectiveTempC);
  const factors = samples.map((s, i) => {
    requireFinite(`samples[${i}].minute`, s.minute);
    const tempC = requireCelsius(`samples[${i}].tempC`, s.tempC);
    return tempC < threshold ? 0 : arrheniusAccelerationFactor({ ...input, tempC });
  });

  let dose = 0;
  for (let i = 1; i < samples.length; i += 1) {
    const dt =
      (samples[i] as TemperatureSample).minute - (samples[i - 1] as TemperatureSample).minute;
    if (dt <= 0) {
      throw new ProcessInputError(
        `samples[${i}].minute`,
        `Log samples must be in increasing minute order; sample ${i + 1} is not after sample ${i}.`,
      );
    }
    dose += (dt * ((factors[i - 1] as number) + (factors[i] as number))) / 2;
  }
  return dose;
}
