import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { capability } from './capability';
import { ProcessInputError } from './process-input-error';
import { expectRelativelyClose } from './test-support';

const REL = 0.001;

describe('capability', () => {
  it('when the §6.1 line widths meet LSL 44 / USL 60, then Cp = 1.0829 and Cpk = 0.9475', () => {
    // REFERENCES §6.1 worked example (derived there, ±0.1 %); d₂ = 1.128 from memory
    const r = capability([52, 55, 51, 54, 53, 56, 52, 50, 54, 53], { lsl: 44, usl: 60 });
    expect(r.n).toBe(10);
    expectRelativelyClose(r.mean, 53, REL);
    expectRelativelyClose(r.sigmaWithin, 2.4626, REL);
    expectRelativelyClose(r.cp, 1.0829, REL);
    expectRelativelyClose(r.cpk, 0.9475, REL);
  });

  // NIST/SEMATECH e-Handbook §6.1.6 example, from memory: USL 20, LSL 8, x̄ 16, s 2 →
  // Cp 1.000, Cpu 0.6667, Cpl 1.3333, Cpk 0.6667. The data 14, 16, 18 have x̄ = 16 and s = 2, so
  // the overall indices Pp/Ppk reproduce those numbers.
  it.each([
    { limits: { lsl: 8, usl: 20 }, pp: 1.0, ppk: 0.6667 },
    { limits: { usl: 20 }, pp: null, ppk: 0.6667 },
    { limits: { lsl: 8 }, pp: null, ppk: 1.3333 },
  ])('when x̄ = 16, s = 2 against $limits, then Pp = $pp and Ppk = $ppk', ({ limits, pp, ppk }) => {
    const r = capability([14, 16, 18], limits);
    expectRelativelyClose(r.sigmaOverall, 2, REL);
    if (pp === null) {
      expect(r.pp).toBeNull();
      expect(r.cp).toBeNull();
    } else {
      expectRelativelyClose(r.pp, pp, REL);
    }
    expectRelativelyClose(r.ppk, ppk, REL);
  });

  it('when limits are two-sided, then Cpk ≤ Cp and Ppk ≤ Pp', () => {
    // Montgomery: Cpk = min(Cpu, Cpl) equals Cp only for a centred process
    fc.assert(
      fc.property(
        // readings to 0.1 (like a gauge), so spread never underflows to 0
        fc.array(
          fc.integer({ min: -1000, max: 1000 }).map((x) => x / 10),
          { minLength: 2, maxLength: 40 },
        ),
        fc.double({ min: 1, max: 500, noNaN: true }),
        (values, width) => {
          fc.pre(new Set(values).size > 1);
          const r = capability(values, { lsl: -width, usl: width });
          expect(r.cpk).toBeLessThanOrEqual((r.cp as number) + 1e-12);
          expect(r.ppk).toBeLessThanOrEqual((r.pp as number) + 1e-12);
        },
      ),
    );
  });

  it.each([
    { name: 'no values', values: [], limits: { lsl: 0, usl: 1 }, field: 'values' },
    { name: 'one value', values: [5], limits: { lsl: 0, usl: 10 }, field: 'values' },
    { name: 'no limits', values: [1, 2, 3], limits: {}, field: 'limits' },
    { name: 'LSL above USL', values: [1, 2, 3], limits: { lsl: 5, usl: 4 }, field: 'usl' },
    { name: 'a NaN limit', values: [1, 2, 3], limits: { lsl: Number.NaN }, field: 'lsl' },
    { name: 'a NaN value', values: [1, Number.NaN], limits: { lsl: 0 }, field: 'values[1]' },
    { name: 'no variation', values: [4, 4, 4], limits: { lsl: 0, usl: 10 }, field: 'values' },
  ])('when given $name, then ProcessInputError names $field', ({ values, limits, field }) => {
    const call = () => capability(values, limits);
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });
});
