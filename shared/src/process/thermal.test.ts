import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { ProcessInputError } from './process-input-error';
import { expectRelativelyClose } from './test-support';
import {
  activationEnergyFromRateRatioKJPerMol,
  arrheniusAccelerationFactor,
  arrheniusEquivalentMinutes,
  holdsEquivalentMinutes,
} from './thermal';

// REFERENCES §5.1 worked examples (derived there; R = 8.314462618 J/(mol·K), from memory as exact SI), ±0.1 %.
const REL = 0.001;
const CURE = { referenceTempC: 150, activationEnergyKJPerMol: 80 };

describe('arrheniusEquivalentMinutes', () => {
  it('when 80 kJ/mol ink is held 30 min at 120 °C, then the factor is 0.17638 and it is worth 5.291 min at 150 °C', () => {
    // REFERENCES §5.1 single hold: AF = 0.17638, t_eq = 5.291 min
    expectRelativelyClose(arrheniusAccelerationFactor({ ...CURE, tempC: 120 }), 0.17638, REL);
    expectRelativelyClose(
      arrheniusEquivalentMinutes({ ...CURE, minutes: 30, atTempC: 120 }),
      5.291,
      REL,
    );
  });

  it.each([
    // Arrhenius ratio form (REFERENCES §5.1): hotter than reference → factor above 1, zero Ea → no temperature effect
    { tempC: 170, ea: 80, check: (af: number) => af > 1 },
    { tempC: 120, ea: 0, check: (af: number) => af === 1 },
  ])(
    'when at $tempC °C with Ea = $ea kJ/mol, then the factor behaves as Arrhenius predicts',
    ({ tempC, ea, check }) => {
      expect(
        check(
          arrheniusAccelerationFactor({ tempC, referenceTempC: 150, activationEnergyKJPerMol: ea }),
        ),
      ).toBe(true);
    },
  );

  it('when the hold is at the reference temperature, then equivalent time equals the time', () => {
    // REFERENCES §5.1: AF(Tref → Tref) = exp(0) = 1
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        fc.double({ min: -50, max: 400, noNaN: true }),
        fc.double({ min: 0, max: 300, noNaN: true }),
        (minutes, tempC, ea) => {
          const t = arrheniusEquivalentMinutes({
            minutes,
            atTempC: tempC,
            referenceTempC: tempC,
            activationEnergyKJPerMol: ea,
          });
          expect(t).toBe(minutes);
        },
      ),
    );
  });

  it.each([
    { field: 'minutes', input: { ...CURE, minutes: -1, atTempC: 120 } },
    { field: 'atTempC', input: { ...CURE, minutes: 10, atTempC: Number.NaN } },
    { field: 'tempC', input: { ...CURE, minutes: 10, atTempC: -274 } },
    {
      field: 'activationEnergyKJPerMol',
      input: { ...CURE, minutes: 10, atTempC: 120, activationEnergyKJPerMol: -5 },
    },
    {
      field: 'referenceTempC',
      input: { ...CURE, minutes: 10, atTempC: 120, referenceTempC: -273.15 },
    },
  ])('when $field is not physical, then ProcessInputError is thrown', ({ input }) => {
    expect(() => arrheniusEquivalentMinutes(input)).toThrow(ProcessInputError);
  });
});

describe('holdsEquivalentMinutes', () => {
  const THREE_STEP = [
    { minutes: 10, tempC: 100 },
    { minutes: 20, tempC: 130 },
    { minutes: 10, tempC: 150 },
  ];

  it('when the three-step profile runs, then it is worth 16.948 min at 150 °C', () => {
    // REFERENCES §5.1 three-step profile: t_eq = 16.948 min
    expectRelativelyClose(holdsEquivalentMinutes({ ...CURE, holds: THREE_STEP }), 16.948, REL);
  });

  it('when holds below the threshold are excluded, then only the warm holds count', () => {
    // REFERENCES §5.1: the 150 °C hold alone is worth its own 10 min at the 150 °C reference
    expectRelativelyClose(
      holdsEquivalentMinutes({ ...CURE, holds: THREE_STEP, minEffectiveTempC: 140 }),
      10,
      REL,
    );
  });

  it.each([
    { name: 'no holds', holds: [] },
    { name: 'a negative hold', holds: [{ minutes: -5, tempC: 120 }] },
  ])('when given $name, then ProcessInputError is thrown', ({ holds }) => {
    expect(() => holdsEquivalentMinutes({ ...CURE, holds })).toThrow(ProcessInputError);
  });
});

describe('activationEnergyFromRateRatioKJPerMol', () => {
  it('when the rate doubles between 20 °C and 30 °C, then Ea = 51.22 kJ/mol', () => {
    // REFERENCES §5.1 doubling rule: Ea = 51.22 kJ/mol
    expectRelativelyClose(
      activationEnergyFromRateRatioKJPerMol({ lowTempC: 20, highTempC: 30, rateRatio: 2 }),
      51.22,
      REL,
    );
  });

  it('when Ea comes from a rate ratio, then the Arrhenius factor gives that ratio back', () => {
    // REFERENCES §5.1: AF and Ea = R ln2/(1/T1 − 1/T2) are inverse forms
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 200, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.double({ min: 1.01, max: 50, noNaN: true }),
        (lowTempC, span, rateRatio) => {
          const ea = activationEnergyFromRateRatioKJPerMol({
            lowTempC,
            highTempC: lowTempC + span,
            rateRatio,
          });
          const af = arrheniusAccelerationFactor({
            tempC: lowTempC + span,
            referenceTempC: lowTempC,
            activationEnergyKJPerMol: ea,
          });
          expect(af / rateRatio).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it.each([
    { field: 'highTempC', input: { lowTempC: 30, highTempC: 20, rateRatio: 2 } },
    { field: 'rateRatio', input: { lowTempC: 20, highTempC: 30, rateRatio: 0 } },
  ])('when $field is unusable, then ProcessInputError names it', ({ field, input }) => {
    expect(() => activationEnergyFromRateRatioKJPerMol(input)).toThrow(
      expect.objectContaining({ field }),
    );
  });
});
