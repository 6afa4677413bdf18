import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { ProcessInputError } from './process-input-error';
import { gaugeFactor, gaugeFactorFit, stretchedResistanceOhm } from './strain-gauge';
import { expectRelativelyClose } from './test-support';

// REFERENCES §4.4 worked examples (derived there from R/R0 = (1 + ε)², §4.2), tolerance ±0.1 %.
const SECTION_4_4 = [
  { strain: 0.1, ratio: 1.21, gf: 2.1 },
  { strain: 0.2, ratio: 1.44, gf: 2.2 },
  { strain: 0.5, ratio: 2.25, gf: 2.5 },
  { strain: 1.0, ratio: 4.0, gf: 3.0 },
];

describe('stretchedResistanceOhm', () => {
  it.each(SECTION_4_4)('when stretched by ε = $strain, then R/R0 = $ratio', ({ strain, ratio }) => {
    expectRelativelyClose(stretchedResistanceOhm({ unstrainedOhm: 10, strain }) / 10, ratio, 0.001);
  });

  it('when strain grows, then resistance never falls (monotone for ε > −1)', () => {
    // REFERENCES §4.2: R/R0 = (1 + ε)² is increasing for ε > −1
    fc.assert(
      fc.property(
        fc.double({ min: 0.001, max: 1e4, noNaN: true }),
        fc.double({ min: -0.99, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (r0, strain, extra) => {
          const low = stretchedResistanceOhm({ unstrainedOhm: r0, strain });
          const high = stretchedResistanceOhm({
            unstrainedOhm: r0,
            strain: Math.min(strain + extra, 10),
          });
          expect(high).toBeGreaterThanOrEqual(low);
        },
      ),
    );
  });

  it.each([
    { field: 'strain', input: { unstrainedOhm: 10, strain: -1 } },
    { field: 'strain', input: { unstrainedOhm: 10, strain: Number.NaN } },
    { field: 'unstrainedOhm', input: { unstrainedOhm: -10, strain: 0.1 } },
  ])('when $field is not physical, then ProcessInputError names it', ({ field, input }) => {
    expect(() => stretchedResistanceOhm(input)).toThrow(expect.objectContaining({ field }));
  });
});

describe('gaugeFactor', () => {
  it.each(SECTION_4_4)(
    'when an ideal conductor reads R0 at rest and R0(1+ε)² at ε = $strain, then GF = $gf',
    ({ strain, ratio, gf }) => {
      // REFERENCES §4.4: GF = (ΔR/R0)/ε = 2 + ε for an incompressible conductor
      expectRelativelyClose(
        gaugeFactor([
          { strain: 0, ohm: 50 },
          { strain, ohm: 50 * ratio },
        ]),
        gf,
        0.001,
      );
    },
  );

  it('when there is a reading at strain 0, then R0 is that reading', () => {
    // REFERENCES §4.4: ε = 0.5 gives R/R0 = 2.25 and GF = 2.5
    const fit = gaugeFactorFit([
      { strain: 0, ohm: 10 },
      { strain: 0.5, ohm: 22.5 },
    ]);
    expect(fit).toEqual({ gaugeFactor: 2.5, unstrainedOhm: 10, unstrainedOhmFrom: 'measured' });
  });

  it('when there is no reading at strain 0, then R0 is the fit intercept', () => {
    // GF definition (ΔR/R0)/ε, REFERENCES §4.2; small-strain geometric GF = 2 for ν = 0.5: data on R0(1 + 2ε) with R0 = 100
    const fit = gaugeFactorFit(
      [0.01, 0.02, 0.03].map((strain) => ({ strain, ohm: 100 * (1 + 2 * strain) })),
    );
    expect(fit.unstrainedOhmFrom).toBe('fit-intercept');
    expect(fit.unstrainedOhm).toBeCloseTo(100, 9);
    expect(fit.gaugeFactor).toBeCloseTo(2, 9);
  });

  it('when readings lie exactly on a line for any R0 and GF, then the fit returns that GF', () => {
    // GF definition (ΔR/R0)/ε, REFERENCES §4.2
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 1e4, noNaN: true }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.boolean(),
        (r0, gf, withZero) => {
          const strains = withZero ? [0, 0.05, 0.1, 0.2] : [0.05, 0.1, 0.2];
          const points = strains.map((strain) => ({ strain, ohm: r0 * (1 + gf * strain) }));
          expect(gaugeFactor(points) / gf).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it.each([
    { name: 'no points', points: [] },
    { name: 'one point', points: [{ strain: 0, ohm: 10 }] },
    {
      name: 'one strain only',
      points: [
        { strain: 0.1, ohm: 10 },
        { strain: 0.1, ohm: 11 },
      ],
    },
    {
      name: 'a negative reading',
      points: [
        { strain: 0, ohm: 10 },
        { strain: 0.1, ohm: -11 },
      ],
    },
    {
      name: 'strain ≤ −1',
      points: [
        { strain: 0, ohm: 10 },
        { strain: -1.5, ohm: 11 },
      ],
    },
  ])('when given $name, then ProcessInputError is thrown', ({ points }) => {
    expect(() => gaugeFactor(points)).toThrow(ProcessInputError);
  });
});
