import { describe, expect, it } from 'vitest';

import {
  resistanceAtReferenceOhm,
  sheetResistanceOhmPerSq,
  traceResistanceOhm,
} from './electrical';
import { ProcessInputError } from './process-input-error';
import { expectRelativelyClose } from './test-support';

// REFERENCES §4.4 worked examples (derived there), tolerance ±0.1 %.
const REL = 0.001;

describe('sheetResistanceOhmPerSq', () => {
  it('when bulk silver (1.59e-8 Ω·m) is 1 µm thick, then Rs = 0.0159 Ω/sq', () => {
    // REFERENCES §4.4; silver resistivity 1.59e-8 Ω·m at 20 °C from §4.1 (standard resistivity table)
    expectRelativelyClose(
      sheetResistanceOhmPerSq({ resistivityOhmM: 1.59e-8, thicknessUm: 1 }),
      0.0159,
      REL,
    );
  });
});

describe('traceResistanceOhm', () => {
  it.each([
    // REFERENCES §4.4: 0.0159 Ω/sq × 200 squares = 3.18 Ω
    { rs: 0.0159, passes: undefined, expected: 3.18 },
    // REFERENCES §4.4: at 3 × bulk resistivity (printed silver, §4.3) → 9.54 Ω
    { rs: 0.0477, passes: undefined, expected: 9.54 },
    // Passes in parallel: common practice approximation, no source — 2 passes halve §4.4's 3.18 Ω
    { rs: 0.0159, passes: 2, expected: 1.59 },
  ])(
    'when Rs = $rs Ω/sq over 100 mm × 0.5 mm in $passes passes, then R = $expected Ω',
    ({ rs, passes, expected }) => {
      const r = traceResistanceOhm({
        sheetResistanceOhmPerSq: rs,
        lengthMm: 100,
        widthMm: 0.5,
        passes,
      });
      expectRelativelyClose(r, expected, REL);
    },
  );

  it.each([
    { field: 'sheetResistanceOhmPerSq', value: -0.1 },
    { field: 'lengthMm', value: Number.NaN },
    { field: 'widthMm', value: 0 },
    { field: 'passes', value: 0 },
    { field: 'passes', value: 1.5 },
  ])('when $field is $value, then ProcessInputError names it', ({ field, value }) => {
    const call = () =>
      traceResistanceOhm({
        sheetResistanceOhmPerSq: 0.0159,
        lengthMm: 100,
        widthMm: 0.5,
        [field]: value,
      });
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });
});

describe('resistanceAtReferenceOhm', () => {
  it.each([
    // REFERENCES §4.4: Cu trace 10.0 Ω at 20 °C, α = 0.0039 /K (§4.1 table) reads 11.56 Ω at 60 °C
    { measured: 11.56, at: 60, ref: undefined, tcr: 0.0039, expected: 10.0 },
    // Same example with an explicit 20 °C reference (α is stated at 20 °C, REFERENCES §4.1)
    { measured: 11.56, at: 60, ref: 20, tcr: 0.0039, expected: 10.0 },
    // REFERENCES §4.4 read below the reference: 10.0 Ω × (1 + 0.0039 × (0 − 20)) = 9.22 Ω at 0 °C, derived
    // from the same linear form (§4.2)
    { measured: 9.22, at: 0, ref: undefined, tcr: 0.0039, expected: 10.0 },
    // Linear model R(T) = R20[1 + α(T − 20)] (REFERENCES §4.2): at the reference temperature nothing changes
    { measured: 10.0, at: 20, ref: undefined, tcr: 0.0039, expected: 10.0 },
  ])(
    'when $measured Ω is read at $at °C (ref $ref), then it is $expected Ω at the reference',
    ({ measured, at, ref, tcr, expected }) => {
      const r = resistanceAtReferenceOhm({
        measuredOhm: measured,
        measuredTempC: at,
        referenceTempC: ref,
        tcrPerK: tcr,
      });
      expectRelativelyClose(r, expected, REL);
    },
  );

  it('when the coefficient is negative (a conductor that improves when warm), then a warm reading corrects upward', () => {
    // REFERENCES §4.2 linear form with α < 0: 1 + α(T − Tref) < 1, so R_ref > R
    const r = resistanceAtReferenceOhm({ measuredOhm: 100, measuredTempC: 40, tcrPerK: -0.002 });
    expect(r).toBeGreaterThan(100);
  });

  it.each([
    { field: 'measuredOhm', input: { measuredOhm: -1, measuredTempC: 25, tcrPerK: 0.0039 } },
    { field: 'measuredTempC', input: { measuredOhm: 10, measuredTempC: -300, tcrPerK: 0.0039 } },
    { field: 'tcrPerK', input: { measuredOhm: 10, measuredTempC: 25, tcrPerK: Number.NaN } },
    // 1 + α(T − Tref) ≤ 0 is outside the linear model
    { field: 'tcrPerK', input: { measuredOhm: 10, measuredTempC: 520, tcrPerK: -0.002 } },
  ])('when $field is not usable, then ProcessInputError names it', ({ field, input }) => {
    expect(() => resistanceAtReferenceOhm(input)).toThrow(expect.objectContaining({ field }));
    expect(() => resistanceAtReferenceOhm(input)).toThrow(ProcessInputError);
  });
});
