import { describe, expect, it } from 'vitest';

import { expectRelativelyClose } from '../../process/test-support';
import { makeInk } from '../recipe/test-fixtures';
import { cureLogDose } from './cure-log';

// REFERENCES §5.1: Ea = 80 kJ/mol, T_ref = 150 °C; 10 min @100 °C + 20 min @130 °C + 10 min @150 °C → 16.948 min
// (±0.1 %). Logged here with 0.001-min steps between holds, which add under 0.002 min. The reference
// minutes (10 and 20) are invented for the test; the verdict follows from 16.948 against them.
const THREE_STEP_LOG = [
  { minute: 0, tempC: 100 },
  { minute: 10, tempC: 100 },
  { minute: 10.001, tempC: 130 },
  { minute: 30, tempC: 130 },
  { minute: 30.001, tempC: 150 },
  { minute: 40, tempC: 150 },
];
const ink = (overrides: Parameters<typeof makeInk>[0] = {}) =>
  makeInk({ name: 'Silver ink', cureReferenceTempC: 150, activationEnergyKJPerMol: 80, minEffectiveCureTempC: null, ...overrides });

describe('cureLogDose', () => {
  it.each([
    { referenceMinutes: 10, percent: 169.48, isShort: false },
    { referenceMinutes: 20, percent: 84.74, isShort: true },
  ])('when the §5.1 three-step profile is logged against a $referenceMinutes-min reference, then short is $isShort', ({ referenceMinutes, percent, isShort }) => {
    const dose = cureLogDose(THREE_STEP_LOG, ink({ cureReferenceMinutes: referenceMinutes }));
    expect(dose.canJudge).toBe(true);
    expectRelativelyClose(dose.equivalentMinutes, 16.948, 0.001);
    expectRelativelyClose(dose.percent, percent, 0.001);
    expect(dose.referenceMinutes).toBe(referenceMinutes);
    expect(dose.isShort).toBe(isShort);
    expect(dose.message).toContain(isShort ? 'The cure is short.' : 'The cure is enough.');
    expect(dose.message).toContain('16.9 min equivalent at 150 °C');
  });

  it('when the points were typed out of order, then they are taken in minute order', () => {
    const shuffled = [THREE_STEP_LOG[3], THREE_STEP_LOG[0], THREE_STEP_LOG[5], THREE_STEP_LOG[1], THREE_STEP_LOG[4], THREE_STEP_LOG[2]].filter((s) => s !== undefined);
    expectRelativelyClose(cureLogDose(shuffled, ink({ cureReferenceMinutes: 10 })).equivalentMinutes, 16.948, 0.001);
  });

  it('when the ink has a minimum effective temperature above the first hold, then that hold counts nothing', () => {
    // [D] from §5.1: AF(100 °C → 150 °C, 80 kJ/mol) = exp(−80000/8.314462618 × (1/373.15 − 1/423.15)) = 0.047509,
    // so dropping the 10-min hold leaves 16.948 − 0.475 = 16.473 min (the 0.001-min step changes it < 0.001 min)
    const floored = cureLogDose(THREE_STEP_LOG, ink({ cureReferenceMinutes: 10, minEffectiveCureTempC: 120 }));
    expectRelativelyClose(floored.equivalentMinutes, 16.473, 0.001);
    expect(floored.message).toContain('below 120 °C count nothing');
  });

  // prettier-ignore
  it.each([
    { name: 'the ink has no activation energy', samples: THREE_STEP_LOG, overrides: { activationEnergyKJPerMol: null }, says: 'needs its reference cure temperature and time and its activation energy' },
    { name: 'the ink has no reference cure', samples: THREE_STEP_LOG, overrides: { cureReferenceTempC: null, cureReferenceMinutes: null }, says: 'needs its reference cure' },
    { name: 'the log has one point', samples: [{ minute: 0, tempC: 150 }], overrides: {}, says: 'at least two points' },
    { name: 'two points share a minute', samples: [{ minute: 0, tempC: 20 }, { minute: 5, tempC: 150 }, { minute: 5, tempC: 140 }], overrides: {}, says: 'share minute 5' },
    { name: 'a temperature is below absolute zero', samples: [{ minute: 0, tempC: -300 }, { minute: 5, tempC: 150 }], overrides: {}, says: 'absolute zero' },
  ])('when $name, then it cannot be judged and says why', ({ samples, overrides, says }) => {
    const dose = cureLogDose(samples, ink({ cureReferenceMinutes: 10, ...overrides }));
    expect(dose).toMatchObject({ canJudge: false, equivalentMinutes: null, referenceMinutes: null, percent: null, isShort: false });
    expect(dose.message).toContain("Can't judge the cure");
    expect(dose.message).toContain(says);
  });
});
