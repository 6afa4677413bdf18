import { describe, expect, it } from 'vitest';

import { buildRecipeContext } from './recipe-context';
import { jettingChecks } from './jetting-checks';
import { makeInk, makeInput, makePrinter, steps } from './test-fixtures';

// Reference fluids stand in for inks (REFERENCES §1.3): glycerol–water 50 wt % at 20 °C,
// η 6.00 mPa·s and ρ 1126 kg/m³ derived from correlations whose constants are from memory, γ ≈ 70
// mN/m from memory; ethylene glycol at 25 °C, η 16.1, γ 47.99 (CRC-attributed data page), ρ 1110 from memory;
// water at 20 °C, η 1.002, ρ 998.2, γ 72.74.
const fluid = (name: string, viscosityMilliPaS: number, surfaceTensionMilliNPerM: number, densityKgPerM3: number) =>
  makeInk({ name, viscosityMilliPaS, surfaceTensionMilliNPerM, densityKgPerM3, surfaceTensionDispersiveMilliNPerM: null, surfaceTensionPolarMilliNPerM: null });
const GLYCEROL_WATER = fluid('glycerol–water', 6.0, 70, 1126);
const GLYCOL = fluid('ethylene glycol', 16.1, 47.99, 1110);
const WATER = fluid('water', 1.002, 72.74, 998.2);

const judge = (ink: ReturnType<typeof fluid>, nozzleDiameterUm: number, jettingSpeedMetresPerSecond: number) =>
  jettingChecks(buildRecipeContext(makeInput({ inks: [ink], printers: [makePrinter({ nozzleDiameterUm, jettingSpeedMetresPerSecond })], steps: [steps.print('print-1')] })));

describe('jettingChecks', () => {
  // prettier-ignore
  it.each([
    // REFERENCES §1.4 [D]: glycerol–water, 21 µm, 6 m/s → Z = 6.782, We = 12.16: inside 1 < Z < 10 (Reis & Derby 2000)
    { name: 'glycerol–water through 21 µm', ink: GLYCEROL_WATER, d: 21, v: 6, status: 'pass', shows: ['Z = 6.78', 'We = 12.2'] },
    // REFERENCES §1.4 [D]: through 50 µm → Z = 10.46, just above 10: satellites
    { name: 'glycerol–water through 50 µm', ink: GLYCEROL_WATER, d: 50, v: 6, status: 'blocked', shows: ['Z = 10.5'] },
    // REFERENCES §1.4 [D]: ethylene glycol, 21 µm → Z = 2.077, inside 1 < Z < 10
    { name: 'ethylene glycol through 21 µm', ink: GLYCOL, d: 21, v: 6, status: 'pass', shows: ['Z = 2.08', 'We = 17.5'] },
    // REFERENCES §1.4 [D]: water at 20 °C, 21 µm → Z = 38.97: satellites
    { name: 'water through 21 µm', ink: WATER, d: 21, v: 6, status: 'blocked', shows: ['Z = 39'] },
    // REFERENCES §1.4 [D]: glycerol–water, 21 µm needs v > 3.441 m/s for We > 4 (Duineveld et al. 2002)
    { name: 'glycerol–water at 3.40 m/s, just below We = 4', ink: GLYCEROL_WATER, d: 21, v: 3.4, status: 'blocked', shows: ['We = 3.9'] },
    { name: 'glycerol–water at 3.50 m/s, just above We = 4', ink: GLYCEROL_WATER, d: 21, v: 3.5, status: 'pass', shows: ['We = 4.14'] },
    // Derived here from REFERENCES §1.4: K = We^½·Re^¼ = 7.691 at 6 m/s scales as v^1.25, so K = 50 near 26.8 m/s;
    // at 30 m/s K ≈ 57.5 > 50 → splashing, only a Warning (estimate); at 20 m/s K ≈ 34.6 → Pass
    { name: 'glycerol–water at 30 m/s', ink: GLYCEROL_WATER, d: 21, v: 30, status: 'warning', shows: ['We^½·Re^¼ = 57.5'] },
    { name: 'glycerol–water at 20 m/s', ink: GLYCEROL_WATER, d: 21, v: 20, status: 'pass', shows: ['We^½·Re^¼ = 34.6'] },
  ])('when $name, then the check is $status', ({ ink, d, v, status, shows }) => {
    const [check] = judge(ink, d, v);
    expect(check).toMatchObject({ id: 'jettability:print-1', stepId: 'print-1', status });
    for (const text of shows) expect(check?.numbers).toContain(text);
  });

  it('when the ink is too viscous for the nozzle, then it is blocked and the reason says so', () => {
    // Z = √(ργd)/η: ethylene glycol made 20× more viscous gives Z ≈ 0.10 < 1 (REFERENCES §1.1 formula)
    const [check] = judge({ ...GLYCOL, viscosityMilliPaS: 322 }, 21, 6);
    expect(check?.status).toBe('blocked');
    expect(check?.why).toMatch(/too thick/);
  });

  it('when the print pass names an ink that is not on record, then jetting is not judged (references reports it)', () => {
    const ctx = buildRecipeContext(makeInput({ steps: [steps.print('print-1', { inkId: 99 })] }));
    expect(jettingChecks(ctx)).toEqual([]);
  });
});
