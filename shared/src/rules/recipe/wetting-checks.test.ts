import { describe, expect, it } from 'vitest';

import { checksOf, makeInk, makeInput, makeSetup, makeSubstrate, steps } from './test-fixtures';
import { wettingStatus } from './wetting-checks';

// REFERENCES §2.3 [D]: water 72.5°, diiodomethane 27° (water 72.8/21.8/51.0, DIM 50.8/50.8/0)
// → γS = 50.359 mN/m by OWRK (Owens & Wendt 1969). The fixture film carries exactly these angles.
const inkOf = (surfaceTensionMilliNPerM: number) =>
  makeInk({ surfaceTensionMilliNPerM, surfaceTensionDispersiveMilliNPerM: null, surfaceTensionPolarMilliNPerM: null });

describe('wettingStatus', () => {
  // 10 mN/m margin: common practice, no source (REFERENCES §2.4 practice page: roughly 8–10 mN/m)
  it.each([
    { margin: 10, status: 'pass' },
    { margin: 9.99, status: 'warning' },
    { margin: 0, status: 'warning' },
    { margin: -0.01, status: 'blocked' },
  ])('when the margin is $margin mN/m, then the status is $status', ({ margin, status }) => {
    expect(wettingStatus(margin)).toBe(status);
  });
});

describe('wettingChecks', () => {
  // prettier-ignore
  it.each([
    // REFERENCES §2.3: OWRK γS = 50.359; the ink tensions straddle the 10 mN/m and 0 mN/m lines by ±0.01,
    // so these also pin the OWRK figure to ±0.01 mN/m
    { ink: 40.35, status: 'pass', margin: 'margin 10 mN/m' },
    { ink: 40.37, status: 'warning', margin: 'margin 9.99 mN/m' },
    { ink: 50.35, status: 'warning', margin: 'margin 0.009' },
    { ink: 50.37, status: 'blocked', margin: 'margin -0.01' },
  ])('when an ink of $ink mN/m meets the untreated OWRK film, then it is $status', ({ ink, status, margin }) => {
    const [check] = checksOf('wetting', makeInput({ inks: [inkOf(ink)], steps: [steps.print('print-1')] }));
    expect(check).toMatchObject({ id: 'wetting:print-1', status });
    expect(check?.numbers).toContain(margin);
    expect(check?.numbers).toContain('surface 50.4');
  });

  // prettier-ignore
  it.each([
    { name: 'a plasma treatment to 62 mN/m comes before', target: 62, status: 'pass' },
    { name: 'a treatment to 58 mN/m comes before', target: 58, status: 'warning' },
    { name: 'a treatment without a target comes before', target: null, status: 'blocked' },
  ])('when $name, then a 52 mN/m ink is $status', ({ target, status }) => {
    // The treatment's target overrides the film's 50.36 mN/m (REFERENCES §2.3): 62 − 52 = 10, 58 − 52 = 6, 50.36 − 52 < 0
    const input = makeInput({ inks: [inkOf(52)], steps: [steps.treatment('plasma', { targetSurfaceEnergyMilliNPerM: target }), steps.print('print-1')] });
    expect(checksOf('wetting', input)[0]?.status).toBe(status);
  });

  it('when the treatment sets a target water contact angle, then the numbers state it as the floor check', () => {
    const input = makeInput({ inks: [inkOf(30)], steps: [steps.treatment('plasma', { targetWaterContactAngleDeg: 35 }, { title: 'Plasma' }), steps.print('print-1')] });
    expect(checksOf('wetting', input)[0]?.numbers).toContain('floor check: water contact angle ≤ 35° after step 1 “Plasma”');
  });

  it('when a treatment comes after the print pass, then it does not count for that pass', () => {
    const input = makeInput({ inks: [inkOf(52)], steps: [steps.print('print-1'), steps.treatment('plasma', { targetSurfaceEnergyMilliNPerM: 70 })] });
    expect(checksOf('wetting', input)[0]?.status).toBe('blocked');
  });

  it('when recorded parts and contact angles are both on record, then the recorded parts win', () => {
    const film = makeSubstrate({ surfaceEnergyDispersiveMilliNPerM: 30, surfaceEnergyPolarMilliNPerM: 5 });
    const [check] = checksOf('wetting', makeInput({ inks: [inkOf(30)], substrates: [film], steps: [steps.print('print-1')] }));
    expect(check).toMatchObject({ status: 'warning' });
    expect(check?.numbers).toContain('surface 35 − ink 30 = margin 5 mN/m');
  });

  it('when the film has no surface energy on record, then the check warns it cannot judge', () => {
    const film = makeSubstrate({ waterContactAngleDeg: null, diiodomethaneContactAngleDeg: null });
    const [check] = checksOf('wetting', makeInput({ substrates: [film], steps: [steps.print('print-1')] }));
    expect(check?.status).toBe('warning');
    expect(check?.why).toMatch(/Can't check wetting/);
  });

  it('when a pass comes after the transfer, then it is judged on the receiving substrate', () => {
    const receiving = makeSubstrate({ id: 2, name: 'Receiving TPU', waterContactAngleDeg: null, diiodomethaneContactAngleDeg: null, surfaceEnergyDispersiveMilliNPerM: 20, surfaceEnergyPolarMilliNPerM: 5 });
    const input = makeInput({
      setup: makeSetup({ receivingSubstrateId: 2 }),
      substrates: [makeSubstrate(), receiving],
      inks: [inkOf(30)],
      steps: [steps.print('before'), steps.dry('dry'), steps.transfer('press'), steps.print('after')],
    });
    const [before, after] = checksOf('wetting', input);
    expect(before?.status).toBe('pass');
    expect(after).toMatchObject({ stepId: 'after', status: 'blocked', title: expect.stringContaining('Receiving TPU') });
  });
});
