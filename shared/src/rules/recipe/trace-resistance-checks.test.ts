import { describe, expect, it } from 'vitest';

import type { ReadingSpec } from '../../schemas/recipe-step.schema';
import { checksOf, makeInk, makeInput, makeReadingSpec, steps } from './test-fixtures';
import { isInsideLimits } from './trace-resistance-checks';

// REFERENCES §4.4 [D]: bulk silver 1 µm thick → Rs = 0.0159 Ω/sq; a 100 mm × 0.5 mm trace (200 squares)
// → R = 3.18 Ω; at 3 × bulk 9.54 Ω. Limits straddle those figures so the status pins the arithmetic.
// Passes in parallel, R/passes, is common practice with no source (process/electrical.ts).
const trace = (limits: Partial<ReadingSpec>) => makeReadingSpec({ traceLengthMm: 100, traceWidthMm: 0.5, ...limits });
const judge = (sheetResistanceOhmPerSq: number, passes: number, spec: ReadingSpec) =>
  checksOf('trace-resistance', makeInput({ inks: [makeInk({ sheetResistanceOhmPerSq })], steps: [steps.print('ag', { passes }), steps.cure('cure'), steps.inspect('measure', {}, { readingSpecs: [spec] })] }))[0];

describe('traceResistanceChecks', () => {
  // prettier-ignore
  it.each([
    { name: '3.18 Ω against ≤ 3.19 Ω', rs: 0.0159, passes: 1, spec: trace({ upperLimit: 3.19 }), status: 'pass' },
    { name: '3.18 Ω against ≤ 3.17 Ω', rs: 0.0159, passes: 1, spec: trace({ upperLimit: 3.17 }), status: 'warning' },
    { name: '3.18 Ω against 3.17–3.19 Ω', rs: 0.0159, passes: 1, spec: trace({ lowerLimit: 3.17, upperLimit: 3.19 }), status: 'pass' },
    { name: '9.54 Ω (3 × bulk) against ≥ 9.55 Ω', rs: 0.0477, passes: 1, spec: trace({ lowerLimit: 9.55 }), status: 'warning' },
    { name: 'two passes halve it: 1.59 Ω against ≤ 1.6 Ω', rs: 0.0159, passes: 2, spec: trace({ upperLimit: 1.6 }), status: 'pass' },
    { name: 'two passes, 1.59 Ω against ≤ 1.58 Ω', rs: 0.0159, passes: 2, spec: trace({ upperLimit: 1.58 }), status: 'warning' },
    { name: '3.18 Ω in kΩ against ≤ 0.00319 kΩ', rs: 0.0159, passes: 1, spec: trace({ unit: 'kΩ', upperLimit: 0.00319 }), status: 'pass' },
    { name: '3.18 Ω in mΩ against ≤ 3170 mΩ', rs: 0.0159, passes: 1, spec: trace({ unit: 'mΩ', upperLimit: 3170 }), status: 'warning' },
  ])('when $name, then the check is $status', ({ rs, passes, spec, status }) => {
    expect(judge(rs, passes, spec)).toMatchObject({ id: 'trace-resistance:measure:r-trace', stepId: 'measure', status });
  });

  it('when the expected value is shown, then it sits beside the spec with its squares', () => {
    expect(judge(0.0159, 1, trace({ upperLimit: 5 }))?.numbers).toBe('Fixture silver ink 0.0159 Ω/sq × 200 sq / 1 pass = 3.18 Ω; spec ≤ 5 Ω (100 × 0.5 mm trace)');
  });

  it('when the unit is not a resistance, then the check warns instead of guessing', () => {
    expect(judge(0.0159, 1, trace({ unit: 'Ω/sq', upperLimit: 5 }))?.status).toBe('warning');
  });

  it('when the reading comes before any conductor is printed, then it warns', () => {
    const input = makeInput({ steps: [steps.inspect('early', {}, { readingSpecs: [trace({ upperLimit: 5 })] }), steps.print('ag')] });
    expect(checksOf('trace-resistance', input)[0]).toMatchObject({ status: 'warning', why: expect.stringContaining('No conductive ink is printed') });
  });

  it('when a spec has no trace size, then no expected-resistance check is made', () => {
    expect(judge(0.0159, 1, makeReadingSpec({ upperLimit: 5 }))).toBeUndefined();
  });

  it.each([
    { value: 5, lower: null, upper: null, inside: true },
    { value: 5, lower: 5, upper: 5, inside: true },
    { value: 5, lower: 5.01, upper: null, inside: false },
  ])('when $value is held to $lower–$upper, then inside is $inside', ({ value, lower, upper, inside }) => {
    expect(isInsideLimits(value, { lowerLimit: lower, upperLimit: upper })).toBe(inside);
  });
});
