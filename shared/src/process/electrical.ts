import { requireCelsius, requireFinite, requirePositive } from './input-guards';
import { ProcessInputError } from './process-input-error';

/**
 * Sheet resistance of a uniform film: Rs = ρ / t.
 * @example sheetResistanceOhmPerSq({ resistivityOhmM: 1.59e-8, thicknessUm: 1 }) // → 0.0159 (bulk silver, 1 µm)
 */
export function sheetResistanceOhmPerSq(input: {
  resistivityOhmM: number;
  thicknessUm: number;
}): number {
  const rho = requirePositive('resistivityOhmM', input.resistivityOhmM);
  return rho / (requirePositive('thicknessUm', input.thicknessUm) * 1e-6);
}

/**
 * Trace resistance from sheet resistance and squares: R = Rs·(L/W) / passes. Treating repeated
 * passes as identical layers in parallel is common practice, an approximation with no source:
 * real passes differ (the first wets the substrate, later ones spread on ink).
 *
 * @example
 * // 0.0159 Ω/sq, 100 mm × 0.5 mm (200 squares), one pass → 3.18 Ω
 * traceResistanceOhm({ sheetResistanceOhmPerSq: 0.0159, lengthMm: 100, widthMm: 0.5 })
 */
export function traceResistanceOhm(input: {
  sheetResistanceOhmPerSq: number;
  lengthMm: number;
  widthMm: number;
  passes?: number;
}): number {
  const rs = requirePositive('sheetResistanceOhmPerSq', input.sheetResistanceOhmPerSq);
  const squares =
    requirePositive('lengthMm', input.lengthMm) / requirePositive('widthMm', input.widthMm);
  const passes = input.passes ?? 1;
  if (!Number.isInteger(passes) || passes < 1) {
    throw new ProcessInputError(
      'passes',
      `Passes must be a whole number of 1 or more; got ${passes}.`,
    );
  }
  return (rs * squares) / passes;
}

/**
 * Resistance corrected to a reference temperature with a linear temperature coefficient:
 * R_ref = R / (1 + α(T − T_ref)). α must be stated at T_ref (tables quote it at 20 °C).
 *
 * @example
 * // copper trace reading 11.56 Ω at 60 °C, α = 0.0039 /K → 10.0 Ω at 20 °C
 * resistanceAtReferenceOhm({ measuredOhm: 11.56, measuredTempC: 60, tcrPerK: 0.0039 })
 */
export function resistanceAtReferenceOhm(input: {
  measuredOhm: number;
  measuredTempC: number;
  referenceTempC?: number;
  tcrPerK: number;
}): number {
  const r = requirePositive('measuredOhm', input.measuredOhm);
  const t = requireCelsius('measuredTempC', input.measuredTempC);
  const tRef = requireCelsius('referenceTempC', input.referenceTempC ?? 20);
  // α may be negative (carbon, PEDOT:PSS), so only the sign of the whole factor is checked.
  const factor = 1 + requireFinite('tcrPerK', input.tcrPerK) * (t - tRef);
  if (factor <= 0) {
    throw new ProcessInputError(
      'tcrPerK',
      `1 + α(T − Tref) = ${factor} is not positive: the linear model does not reach this far.`,
    );
  }
  return r / factor;
}
