import { resistanceAtReferenceOhm } from '../../process/electrical';
import { ProcessInputError } from '../../process/process-input-error';
import type { ReadingSpec } from '../../schemas/recipe-step.schema';
import { numberText, quantityText } from './text-format';

/** Resistance readings are corrected to 20 °C: the temperature TCR tables quote α at (REFERENCES §4.1). */
export const RESISTANCE_REFERENCE_TEMP_C = 20;

// Ω, ohm(s), with an optional m/k/M/G prefix and an optional "per square" (sheet resistance scales
// with the same α, since Rs = ρ/t). NFKC folds the ohm sign U+2126 into the Greek capital omega.
const RESISTANCE_UNIT = /^[mkMG]?(?:Ω|ohms?)(?:\s*\/\s*(?:sq|□))?$/i;

// A corrected value is kept to 12 significant figures: far finer than any meter, and coarse enough
// that 11.56 / 1.156 reads as exactly 10 rather than 10.000000000000002 and breaks a limit of 10.
const CORRECTED_SIGNIFICANT_FIGURES = 12;

export interface ReadingContext {
  ambientTempC?: number | null;
  tcrPerK?: number | null;
  referenceTempC?: number;
}

export interface ReadingEvaluation {
  outOfLimits: boolean;
  side: 'low' | 'high' | null;
  /** The value corrected to `correctedTo` °C (resistance with a known ambient and α), else null. */
  correctedValue: number | null;
  correctedTo: number | null;
  limitsText: string;
  message: string;
}

/**
 * Whether a unit is a resistance (Ω, kΩ, MΩ, mΩ, ohm, Ω/sq), so a reading in it can be corrected.
 * @example isResistanceUnit('kΩ') // → true; isResistanceUnit('mN/m') // → false
 */
export function isResistanceUnit(unit: string): boolean {
  return RESISTANCE_UNIT.test(unit.normalize('NFKC').trim());
}

/**
 * A spec's limits in words; a missing limit is open on that side.
 * @example readingLimitsText({ lowerLimit: 8, upperLimit: 12, unit: 'Ω' }) // → '8–12 Ω'
 */
export function readingLimitsText(spec: Pick<ReadingSpec, 'lowerLimit' | 'upperLimit' | 'unit'>): string {
  const { lowerLimit: lo, upperLimit: hi, unit } = spec;
  if (lo !== null && hi !== null) return lo === hi ? `exactly ${quantityText(lo, unit)}` : `${numberText(lo)}–${quantityText(hi, unit)}`;
  if (lo !== null) return `≥ ${quantityText(lo, unit)}`;
  if (hi !== null) return `≤ ${quantityText(hi, unit)}`;
  return 'no limits';
}

type Correction = { value: number | null; subject: string; note: string };

function correction(spec: Pick<ReadingSpec, 'unit'>, value: number, context: ReadingContext, referenceTempC: number): Correction {
  const raw = quantityText(value, spec.unit);
  const uncorrected = (why: string): Correction => ({ value: null, subject: raw, note: ` ${why}, so the raw value is judged.` });
  if (!isResistanceUnit(spec.unit)) return { value: null, subject: raw, note: '' };
  const { ambientTempC, tcrPerK } = context;
  if (ambientTempC == null) return uncorrected('No room temperature was given');
  if (tcrPerK == null) return uncorrected('The ink has no temperature coefficient on record');
  try {
    const corrected = resistanceAtReferenceOhm({ measuredOhm: value, measuredTempC: ambientTempC, referenceTempC, tcrPerK });
    const rounded = Number(corrected.toPrecision(CORRECTED_SIGNIFICANT_FIGURES));
    const subject = `${raw} at ${numberText(ambientTempC)} °C is ${quantityText(rounded, spec.unit)} at ${numberText(referenceTempC)} °C (α ${numberText(tcrPerK)} /K)`;
    return { value: rounded, subject, note: ' Limits are judged on the corrected value.' };
  } catch (error) {
    if (!(error instanceof ProcessInputError)) throw error;
    return uncorrected(`It can't be corrected to ${numberText(referenceTempC)} °C (${error.message.replace(/\.$/, '')})`);
  }
}

/**
 * Judges a reading against its spec. A resistance reading (Ω, kΩ, MΩ, Ω/sq …) taken with a known
 * room temperature and α is first corrected to 20 °C, R₂₀ = R / (1 + α(T − 20)), and **the limits
 * are judged on the corrected value**: limits describe the trace, not the room it was measured
 * in, so a warm bench must not pass a high trace or fail a good one. Without both numbers the raw
 * value is judged and the message says why. A missing limit is open on that side; a value exactly
 * on a limit is in limits. Throws ProcessInputError for a non-finite value (forms refuse those).
 *
 * @example
 * // copper trace 11.56 Ω at 60 °C, α 0.0039 /K, limit ≤ 10.5 Ω → corrected 10 Ω, in limits (REFERENCES §4.4)
 * evaluateReading(spec, 11.56, { ambientTempC: 60, tcrPerK: 0.0039 })
 * // → { outOfLimits: false, side: null, correctedValue: 10, correctedTo: 20, limitsText: '≤ 10.5 Ω',
 * //     message: '11.56 Ω at 60 °C is 10 Ω at 20 °C (α 0.0039 /K): within limits (≤ 10.5 Ω). Limits are judged on the corrected value.' }
 */
export function evaluateReading(
  spec: Pick<ReadingSpec, 'name' | 'unit' | 'lowerLimit' | 'upperLimit'>,
  value: number,
  context: ReadingContext = {},
): ReadingEvaluation {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ProcessInputError('value', `A reading must be a finite number; got ${String(value)}.`);
  }
  const referenceTempC = context.referenceTempC ?? RESISTANCE_REFERENCE_TEMP_C;
  const fix = correction(spec, value, context, referenceTempC);
  const judged = fix.value ?? value;
  let side: ReadingEvaluation['side'] = null;
  if (spec.lowerLimit !== null && judged < spec.lowerLimit) side = 'low';
  else if (spec.upperLimit !== null && judged > spec.upperLimit) side = 'high';
  const limitsText = readingLimitsText(spec);
  let verdict = `: within limits (${limitsText}).`;
  if (limitsText === 'no limits') verdict = `: recorded; ${spec.name} has no limits.`;
  else if (side === 'low') verdict = `: out of limits, below the lower limit of ${quantityText(spec.lowerLimit as number, spec.unit)}.`;
  else if (side === 'high') verdict = `: out of limits, above the upper limit of ${quantityText(spec.upperLimit as number, spec.unit)}.`;
  return {
    outOfLimits: side !== null,
    side,
    correctedValue: fix.value,
    correctedTo: fix.value === null ? null : referenceTempC,
    limitsText,
    message: `${fix.subject}${verdict}${fix.note}`,
  };
}
