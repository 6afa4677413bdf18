import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { cureDoseMinutes } from './cure-dose';
import { ProcessInputError } from './process-input-error';
import { expectRelativelyClose } from './test-support';
import { arrheniusAccelerationFactor } from './thermal';

// REFERENCES §5.1 worked examples (derived there), tolerance ±0.1 %.
const REL = 0.001;
const CURE = { referenceTempC: 150, activationEnergyKJPerMol: 80 };

describe('cureDoseMinutes', () => {
  it('when a log holds 120 °C for 30 min, then the dose is 5.291 min at 150 °C', () => {
    // REFERENCES §5.1 single hold: t_eq = 5.291 min
    const samples = [0, 10, 20, 30].map((minute) => ({ minute, tempC: 120 }));
    expectRelativelyClose(cureDoseMinutes({ ...CURE, samples }), 5.291, REL);
  });

  it('when the three-step profile is logged with 0.001-min ramps, then the dose is 16.948 min', () => {
    // REFERENCES §5.1 three-step profile 16.948 min; the two ramps add under 0.002 min (< 0.02 %)
    const samples = [
      { minute: 0, tempC: 100 },
      { minute: 10, tempC: 100 },
      { minute: 10.001, tempC: 130 },
      { minute: 30, tempC: 130 },
      { minute: 30.001, tempC: 150 },
      { minute: 40, tempC: 150 },
    ];
    expectRelativelyClose(cureDoseMinutes({ ...CURE, samples }), 16.948, REL);
  });

  it.each([
    // A week at 40 °C: the Arrhenius factor (REFERENCES §5.1 form) is tiny but adds up without a threshold
    { name: 'no threshold', minEffectiveTempC: undefined, isZero: false },
    { name: 'an 80 °C threshold', minEffectiveTempC: 80, isZero: true },
  ])(
    'when a long bake far too cold is logged with $name, then zero dose is $isZero',
    ({ minEffectiveTempC, isZero }) => {
      const samples = [0, 5000, 10080].map((minute) => ({ minute, tempC: 40 }));
      const dose = cureDoseMinutes({ ...CURE, samples, minEffectiveTempC });
      expect(dose === 0).toBe(isZero);
    },
  );

  it('when an interval crosses the threshold, then it counts half its warm end (documented interpolation rule)', () => {
    // Our rule: factor 0 at the cold sample, trapezoid to the warm one; at 150 °C = reference, AF = 1 (REFERENCES §5.1)
    const samples = [
      { minute: 0, tempC: 20 },
      { minute: 10, tempC: 150 },
    ];
    expect(cureDoseMinutes({ ...CURE, samples, minEffectiveTempC: 100 })).toBeCloseTo(5, 12);
  });

  it('when a sample sits exactly at the threshold, then it counts', () => {
    // Threshold is inclusive; at 150 °C = reference, AF = 1 (REFERENCES §5.1)
    const samples = [0, 10].map((minute) => ({ minute, tempC: 150 }));
    expect(cureDoseMinutes({ ...CURE, samples, minEffectiveTempC: 150 })).toBeCloseTo(10, 12);
  });

  it('when a single sample is logged, then no time has passed and the dose is 0', () => {
    expect(cureDoseMinutes({ ...CURE, samples: [{ minute: 3, tempC: 150 }] })).toBe(0);
  });

  it('when any log stays at the reference temperature, then the dose equals the elapsed time', () => {
    // REFERENCES §5.1: AF(Tref → Tref) = 1
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.01, max: 100, noNaN: true }), { minLength: 1, maxLength: 30 }),
        fc.double({ min: 20, max: 300, noNaN: true }),
        (steps, tempC) => {
          let minute = 0;
          const samples = [
            { minute, tempC },
            ...steps.map((dt) => ({ minute: (minute += dt), tempC })),
          ];
          const dose = cureDoseMinutes({
            samples,
            referenceTempC: tempC,
            activationEnergyKJPerMol: 80,
          });
          expect(dose / minute).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it('when a log is constant at any temperature, then the dose is time × the Arrhenius factor', () => {
    // REFERENCES §5.1: t_eq = Σ Δt·AF; a constant log is one hold
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 300, noNaN: true }),
        fc.double({ min: 1, max: 600, noNaN: true }),
        (tempC, minutes) => {
          const samples = [
            { minute: 0, tempC },
            { minute: minutes, tempC },
          ];
          const expected = minutes * arrheniusAccelerationFactor({ ...CURE, tempC });
          expect(cureDoseMinutes({ ...CURE, samples }) / expected).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it.each([
    { name: 'no samples', samples: [], field: 'samples' },
    {
      name: 'minutes out of order',
      samples: [
        { minute: 0, tempC: 150 },
        { minute: 10, tempC: 150 },
        { minute: 5, tempC: 150 },
      ],
      field: 'samples[2].minute',
    },
    {
      name: 'a repeated minute',
      samples: [
        { minute: 0, tempC: 150 },
        { minute: 0, tempC: 151 },
      ],
      field: 'samples[1].minute',
    },
    {
      name: 'a NaN temperature',
      samples: [{ minute: 0, tempC: Number.NaN }],
      field: 'samples[0].tempC',
    },
    {
      name: 'a NaN minute',
      samples: [{ minute: Number.NaN, tempC: 150 }],
      field: 'samples[0].minute',
    },
  ])('when given $name, then ProcessInputError names $field', ({ samples, field }) => {
    const call = () => cureDoseMinutes({ ...CURE, samples });
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });
});
