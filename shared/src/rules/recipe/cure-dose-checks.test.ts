import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { cureDose } from './cure-dose-checks';
import { heatExposures } from './heat-exposure';
import { checksOf, makeInk, makeInput, makeSubstrate, steps } from './test-fixtures';

// REFERENCES §5.1 [D] (R = 8.314462618 J/(mol·K), from memory as exact SI): Ea = 80 kJ/mol, reference 150 °C;
// three-step profile 10 min @100 °C + 20 min @130 °C + 10 min @150 °C → 16.948 min; one hold 30 min @120 °C → 5.291 min.
// The reference minutes below straddle those figures, so the status pins the dose to the printed digits.
const silver = (overrides: Parameters<typeof makeInk>[0] = {}) =>
  makeInk({ cureReferenceTempC: 150, activationEnergyKJPerMol: 80, minEffectiveCureTempC: null, ...overrides });
const hotFilm = makeSubstrate({ maxContinuousTempC: 300, maxShortExposureTempC: 350 });
const THREE_STEP = [
  steps.dry('dry-100', { temperatureC: 100 }, { minMinutes: 10 }),
  steps.cure('cure-130', { temperatureC: 130, minutes: 20 }),
  steps.cure('cure-150', { temperatureC: 150, minutes: 10 }),
];

const doseCheck = (ink: ReturnType<typeof silver>, after: ReturnType<typeof steps.cure>[] | typeof THREE_STEP, before: typeof THREE_STEP = []) =>
  checksOf('cure-dose', makeInput({ inks: [ink], substrates: [hotFilm], steps: [...before, steps.print('ag'), ...after] }))[0];

describe('cureDoseChecks', () => {
  // prettier-ignore
  it.each([
    { name: 'the three-step profile against a 16.9 min reference', refMinutes: 16.9, after: THREE_STEP, status: 'pass' },
    { name: 'the three-step profile against a 17.0 min reference', refMinutes: 17.0, after: THREE_STEP, status: 'blocked' },
    { name: '30 min at 120 °C against a 5.29 min reference', refMinutes: 5.29, after: [steps.cure('c', { temperatureC: 120, minutes: 30 })], status: 'pass' },
    { name: '30 min at 120 °C against a 5.30 min reference', refMinutes: 5.3, after: [steps.cure('c', { temperatureC: 120, minutes: 30 })], status: 'blocked' },
  ])('when $name, then the dose is $status', ({ refMinutes, after, status }) => {
    const check = doseCheck(silver({ cureReferenceMinutes: refMinutes }), after);
    expect(check).toMatchObject({ id: 'cure-dose:ink-1', stepId: 'ag', status });
  });

  it('when the three-step profile is counted, then the numbers show 16.9 equivalent minutes and the percentage', () => {
    // REFERENCES §5.1: 16.948 min; against a 10 min reference that is 169 %
    const check = doseCheck(silver({ cureReferenceMinutes: 10 }), THREE_STEP);
    expect(check?.numbers).toContain('16.9 min equivalent vs 10 min at 150 °C reference = 169 %');
  });

  it('when the ink ignores heat below 110 °C, then the 100 °C dry stops counting and the dose falls short', () => {
    // Without the floor the profile gives 16.948 ≥ 16.9 (REFERENCES §5.1); the 100 °C hold is worth about 0.48 min
    const check = doseCheck(silver({ cureReferenceMinutes: 16.9, minEffectiveCureTempC: 110 }), THREE_STEP);
    expect(check?.status).toBe('blocked');
    expect(check?.numbers).toContain('below 110 °C, not counted: oven dry 10 min @ 100 °C');
  });

  it('when heat comes only before the print pass, then nothing cures the ink', () => {
    const check = doseCheck(silver({ cureReferenceMinutes: 10 }), [], THREE_STEP);
    expect(check?.status).toBe('blocked');
    expect(check?.why).toMatch(/No heat step follows the last pass/);
  });

  it('when a dry gives no shortest time, then it counts nothing (the recipe guarantees no time)', () => {
    const check = doseCheck(silver({ cureReferenceMinutes: 1 }), [steps.dry('dry', { temperatureC: 150 }, { minMinutes: null, maxMinutes: 60 })]);
    expect(check?.status).toBe('blocked');
  });

  it.each([
    { field: 'activationEnergyKJPerMol' as const },
    { field: 'cureReferenceTempC' as const },
  ])('when the ink lacks $field, then the dose cannot be checked and it warns', ({ field }) => {
    const check = doseCheck(silver({ cureReferenceMinutes: 10, [field]: null }), THREE_STEP);
    expect(check?.status).toBe('warning');
  });

  it('when the ink is a dielectric, then no cure-dose check is made', () => {
    expect(doseCheck(silver({ function: 'dielectric' }), THREE_STEP)).toBeUndefined();
  });

  it('when the same ink prints twice, then the last pass decides and the heat between the passes does not count', () => {
    const input = makeInput({
      inks: [silver({ cureReferenceMinutes: 16.9 })],
      substrates: [hotFilm],
      steps: [steps.print('ag-1'), ...THREE_STEP, steps.print('ag-2'), steps.cure('short', { temperatureC: 150, minutes: 1 })],
    });
    expect(checksOf('cure-dose', input)[0]).toMatchObject({ stepId: 'ag-2', status: 'blocked' });
  });

  it('when another heat step is added later, then the dose never goes down', () => {
    // Arrhenius factors are positive (REFERENCES §5.1), so each later hold adds a non-negative amount
    const hold = fc.record({ tempC: fc.integer({ min: 0, max: 300 }), minutes: fc.double({ min: 0, max: 600, noNaN: true }) });
    fc.assert(
      fc.property(fc.array(hold, { maxLength: 8 }), hold, fc.integer({ min: 0, max: 200 }), (holds, extra, floor) => {
        const ink = silver({ cureReferenceMinutes: 10, minEffectiveCureTempC: floor });
        const recipe = holds.map((h, i) => steps.cure(`c${i}`, { temperatureC: h.tempC, minutes: h.minutes || 1 }));
        const more = [...recipe, steps.cure('extra', { temperatureC: extra.tempC, minutes: extra.minutes || 1 })];
        const before = cureDose(ink, heatExposures(recipe))?.equivalentMinutes ?? Number.NaN;
        const after = cureDose(ink, heatExposures(more))?.equivalentMinutes ?? Number.NaN;
        expect(after).toBeGreaterThanOrEqual(before);
      }),
    );
  });
});
