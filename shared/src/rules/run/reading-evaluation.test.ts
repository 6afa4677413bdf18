import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { ProcessInputError } from '../../process/process-input-error';
import { expectRelativelyClose } from '../../process/test-support';
import { makeReadingSpec } from '../recipe/test-fixtures';
import { evaluateReading, isResistanceUnit, readingLimitsText } from './reading-evaluation';

// REFERENCES §4.4 (derived from the linear form of §4.2): a copper trace of 10.0 Ω at 20 °C with
// α = 0.0039 /K (§4.1, Cu at 20 °C) reads 11.56 Ω at 60 °C; tolerance ±0.1 %.
const CU_ALPHA = 0.0039;
const angle = makeReadingSpec({ name: 'Water contact angle', unit: '°', lowerLimit: 20, upperLimit: 40 });

describe('evaluateReading without temperature correction', () => {
  // prettier-ignore
  it.each([
    { value: 19.9, lower: 20, upper: 40, side: 'low' },
    { value: 20, lower: 20, upper: 40, side: null },
    { value: 30, lower: 20, upper: 40, side: null },
    { value: 40, lower: 20, upper: 40, side: null },
    { value: 40.1, lower: 20, upper: 40, side: 'high' },
    { value: -1e6, lower: null, upper: 40, side: null },
    { value: 1e6, lower: 20, upper: null, side: null },
    { value: 19, lower: 20, upper: null, side: 'low' },
    { value: -5, lower: null, upper: null, side: null },
  ] as const)('when $value is read against [$lower, $upper], then the side is $side', ({ value, lower, upper, side }) => {
    const result = evaluateReading({ ...angle, lowerLimit: lower, upperLimit: upper }, value);
    expect(result.side).toBe(side);
    expect(result.outOfLimits).toBe(side !== null);
    expect(result.correctedValue).toBeNull();
    expect(result.correctedTo).toBeNull();
  });

  it.each([
    { lower: 8, upper: 12, unit: 'Ω', text: '8–12 Ω' },
    { lower: 20, upper: 40, unit: '°', text: '20–40°' },
    { lower: null, upper: 3, unit: 'Ω', text: '≤ 3 Ω' },
    { lower: 100, upper: null, unit: 'kΩ', text: '≥ 100 kΩ' },
    { lower: 5, upper: 5, unit: 'mm', text: 'exactly 5 mm' },
    { lower: null, upper: null, unit: 'Ω', text: 'no limits' },
  ])('when the limits are [$lower, $upper] $unit, then they read "$text"', ({ lower, upper, unit, text }) => {
    expect(readingLimitsText({ lowerLimit: lower, upperLimit: upper, unit })).toBe(text);
  });

  it('when a value is out of limits, then the message names the value, the side and the limit', () => {
    expect(evaluateReading(angle, 45).message).toBe('45°: out of limits, above the upper limit of 40°.');
  });

  it('when the value is not a finite number, then it is refused', () => {
    expect(() => evaluateReading(angle, Number.NaN)).toThrow(ProcessInputError);
  });
});

describe('evaluateReading with temperature correction', () => {
  it('when the forward formula is applied to 10.0 Ω at 60 °C, then the reading is 11.56 Ω (the check value used below)', () => {
    // REFERENCES §4.2 R(T) = R20[1 + α(T − 20)] and §4.4 → 11.56 Ω
    expectRelativelyClose(10.0 * (1 + CU_ALPHA * (60 - 20)), 11.56, 0.001);
  });

  // prettier-ignore
  it.each([
    // REFERENCES §4.4 reversed: 11.56 Ω at 60 °C → 10.0 Ω at 20 °C; the raw value breaks ≤ 10.5, the corrected one does not
    { name: '11.56 Ω at 60 °C against ≤ 10.5 Ω', unit: 'Ω', value: 11.56, ambient: 60, lower: null, upper: 10.5, corrected: 10.0, side: null },
    // same trace, a tighter limit that the corrected value still breaks
    { name: '11.56 Ω at 60 °C against ≤ 9.5 Ω', unit: 'Ω', value: 11.56, ambient: 60, lower: null, upper: 9.5, corrected: 10.0, side: 'high' },
    // [D] from the §4.2 form: 10.0 Ω × (1 + 0.0039 × (0 − 20)) = 9.22 Ω at 0 °C; raw value is below 9.5, corrected is not
    { name: '9.22 Ω at 0 °C against ≥ 9.5 Ω', unit: 'Ω', value: 9.22, ambient: 0, lower: 9.5, upper: null, corrected: 10.0, side: null },
    // [D] 10.0 Ω × 1.156 = 11.56 kΩ: the prefix does not change the correction
    { name: '11.56 kΩ at 60 °C against 10.2–12 kΩ', unit: 'kΩ', value: 11.56, ambient: 60, lower: 10.2, upper: 12, corrected: 10.0, side: 'low' },
  ] as const)('when $name, then the value is judged on its 20 °C correction', ({ unit, value, ambient, lower, upper, corrected, side }) => {
    const spec = makeReadingSpec({ unit, lowerLimit: lower, upperLimit: upper });
    const result = evaluateReading(spec, value, { ambientTempC: ambient, tcrPerK: CU_ALPHA });
    expectRelativelyClose(result.correctedValue, corrected, 0.001);
    expect(result.correctedTo).toBe(20);
    expect(result.side).toBe(side);
    expect(result.message).toContain('Limits are judged on the corrected value.');
  });

  it('when 11.56 Ω at 60 °C meets an upper limit of exactly 10 Ω, then float noise does not fail it (12 significant figures)', () => {
    // 11.56 / 1.156 is 10.000000000000002 in binary floating point; the documented rounding makes it 10
    const result = evaluateReading(makeReadingSpec({ upperLimit: 10 }), 11.56, { ambientTempC: 60, tcrPerK: CU_ALPHA });
    expect(result.correctedValue).toBe(10);
    expect(result.outOfLimits).toBe(false);
  });

  it('when a reference temperature other than 20 °C is asked for, then the value is corrected to it', () => {
    // [D] §4.2 form with T_ref = 60 °C: a reading taken at 60 °C is unchanged
    const result = evaluateReading(makeReadingSpec(), 11.56, { ambientTempC: 60, tcrPerK: CU_ALPHA, referenceTempC: 60 });
    expect(result.correctedValue).toBe(11.56);
    expect(result.correctedTo).toBe(60);
  });

  // prettier-ignore
  it.each([
    { name: 'no room temperature', context: { ambientTempC: null, tcrPerK: CU_ALPHA }, says: 'No room temperature was given' },
    { name: 'no temperature coefficient', context: { ambientTempC: 25, tcrPerK: null }, says: 'no temperature coefficient on record' },
    { name: 'a zero reading (a short)', context: { ambientTempC: 25, tcrPerK: CU_ALPHA }, value: 0, says: "can't be corrected" },
  ])('when a resistance comes with $name, then the raw value is judged and the message says why', ({ context, value, says }) => {
    const result = evaluateReading(makeReadingSpec({ upperLimit: 10 }), value ?? 11, context);
    expect(result.correctedValue).toBeNull();
    expect(result.outOfLimits).toBe((value ?? 11) > 10);
    expect(result.message).toContain(says);
    expect(result.message).toContain('the raw value is judged');
  });

  it('when a reading is not a resistance, then room temperature and α are ignored', () => {
    expect(evaluateReading(angle, 30, { ambientTempC: 60, tcrPerK: CU_ALPHA }).correctedValue).toBeNull();
  });

  it('when any positive resistance is read at 20 °C, then its correction to 20 °C is the value itself', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e9, noNaN: true }), fc.double({ min: -0.01, max: 0.01, noNaN: true }), (value, tcrPerK) => {
        const { correctedValue } = evaluateReading(makeReadingSpec(), value, { ambientTempC: 20, tcrPerK });
        // equal up to the documented 12-significant-figure rounding
        expect(Math.abs((correctedValue as number) - value)).toBeLessThanOrEqual(value * 5e-12);
      }),
    );
  });
});

describe('isResistanceUnit', () => {
  it.each([
    ['Ω', true], ['kΩ', true], ['MΩ', true], ['mΩ', true], ['ohm', true], ['Ohms', true], ['kohm', true],
    ['\u2126', true], ['Ω/sq', true], ['Ω/□', true], ['ohm / sq', true],
    ['Ω·m', false], ['mN/m', false], ['°', false], ['%', false], ['S/cm', false],
  ])('when the unit is "%s", then it is a resistance: %s', (unit, expected) => {
    expect(isResistanceUnit(unit)).toBe(expected);
  });
});
