import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { jettability, minimumEjectionVelocityMetresPerSecond } from './jettability';
import { ProcessInputError } from './process-input-error';
import { expectRelativelyClose } from './test-support';

// Fluids from REFERENCES §1.3 (handbook values, each with its status there).
const WATER_20C = {
  viscosityMilliPaS: 1.002,
  densityKgPerM3: 998.2,
  surfaceTensionMilliNPerM: 72.74,
};
const WATER_25C = {
  viscosityMilliPaS: 0.89,
  densityKgPerM3: 997.07,
  surfaceTensionMilliNPerM: 71.97,
};
// η and γ from the CRC-attributed data page; ρ 1110 is from memory (REFERENCES §1.3).
const GLYCOL_25C = {
  viscosityMilliPaS: 16.1,
  densityKgPerM3: 1110,
  surfaceTensionMilliNPerM: 47.99,
};
// η 6.00 and ρ 1126 derived from the Cheng 2008 and Volk & Kähler 2018 models whose constants are
// from memory; γ ≈ 70 mN/m is from memory (REFERENCES §1.3).
const GLYCEROL_WATER_50_20C = {
  viscosityMilliPaS: 6.0,
  densityKgPerM3: 1126,
  surfaceTensionMilliNPerM: 70,
};

// REFERENCES §1.4 worked examples (L = nozzle diameter, v = 6 m/s), derived there from the §1.3
// handbook values; tolerance ±0.2 %.
// prettier-ignore
const SECTION_1_4 = [
  { name: 'water 20 °C', fluid: WATER_20C, d: 21, oh: 0.02566, z: 38.97, re: 125.52, we: 10.37, k: 10.78, vMin: 3.726 },
  { name: 'water 20 °C', fluid: WATER_20C, d: 50, oh: 0.01663, z: 60.13, re: 298.86, we: 24.7, k: 20.66, vMin: 2.415 },
  { name: 'water 25 °C', fluid: WATER_25C, d: 21, oh: 0.02293, z: 43.62, re: 141.16, we: 10.47, k: 11.16, vMin: 3.708 },
  { name: 'water 25 °C', fluid: WATER_25C, d: 50, oh: 0.01486, z: 67.3, re: 336.09, we: 24.94, k: 21.38, vMin: 2.403 },
  { name: 'ethylene glycol', fluid: GLYCOL_25C, d: 21, oh: 0.4814, z: 2.077, re: 8.687, we: 17.49, k: 7.179, vMin: 2.87 },
  { name: 'ethylene glycol', fluid: GLYCOL_25C, d: 50, oh: 0.312, z: 3.206, re: 20.68, we: 41.63, k: 13.76, vMin: 1.86 },
  { name: 'glycerol–water', fluid: GLYCEROL_WATER_50_20C, d: 21, oh: 0.1475, z: 6.782, re: 23.65, we: 12.16, k: 7.691, vMin: 3.441 },
  { name: 'glycerol–water', fluid: GLYCEROL_WATER_50_20C, d: 50, oh: 0.09556, z: 10.46, re: 56.32, we: 28.96, k: 14.74, vMin: 2.23 },
];

describe('jettability: REFERENCES §1.4 worked examples', () => {
  it.each(SECTION_1_4)(
    'when $name goes through $d µm at 6 m/s, then Oh = $oh, Z = $z, Re = $re, We = $we, K = $k',
    ({ fluid, d, oh, z, re, we, k }) => {
      const r = jettability({ ...fluid, nozzleDiameterUm: d, dropVelocityMetresPerSecond: 6 });
      expectRelativelyClose(r.ohnesorge, oh, 0.002);
      expectRelativelyClose(r.z, z, 0.002);
      expectRelativelyClose(r.reynolds, re, 0.002);
      expectRelativelyClose(r.weber, we, 0.002);
      expectRelativelyClose(r.splashParameter, k, 0.002);
    },
  );

  it.each(SECTION_1_4)(
    'when $name goes through $d µm, then the slowest ejecting speed is $vMin m/s',
    ({ fluid, d, vMin }) => {
      const v = minimumEjectionVelocityMetresPerSecond({ ...fluid, nozzleDiameterUm: d });
      expectRelativelyClose(v, vMin, 0.002);
    },
  );
});

describe('jettability: verdicts', () => {
  // prettier-ignore
  it.each([
    // REFERENCES §1.4: water 20 °C, 21 µm, Z = 38.97, outside both windows → satellites
    { name: 'water, 21 µm', fluid: WATER_20C, d: 21, v: 6, window: 'reis-derby', verdict: 'satellites' },
    { name: 'water, 21 µm', fluid: WATER_20C, d: 21, v: 6, window: 'jang-kim-moon', verdict: 'satellites' },
    // REFERENCES §1.4: ethylene glycol 21 µm, Z = 2.077: inside 1 < Z < 10 (Reis & Derby 2000), below 4 ≤ Z ≤ 14 (Jang, Kim & Moon 2009)
    { name: 'glycol, 21 µm', fluid: GLYCOL_25C, d: 21, v: 6, window: 'reis-derby', verdict: 'jettable' },
    { name: 'glycol, 21 µm', fluid: GLYCOL_25C, d: 21, v: 6, window: 'jang-kim-moon', verdict: 'too-viscous' },
    // REFERENCES §1.4: glycerol–water 50 µm, Z = 10.46: just above 1 < Z < 10, inside 4 ≤ Z ≤ 14
    { name: 'glycerol–water, 50 µm', fluid: GLYCEROL_WATER_50_20C, d: 50, v: 6, window: 'reis-derby', verdict: 'satellites' },
    { name: 'glycerol–water, 50 µm', fluid: GLYCEROL_WATER_50_20C, d: 50, v: 6, window: 'jang-kim-moon', verdict: 'jettable' },
    // REFERENCES §1.4: glycol at 21 µm needs > 2.870 m/s for We > 4 (Duineveld et al. 2002, as cited by Derby 2010)
    { name: 'glycol, 21 µm, slow', fluid: GLYCOL_25C, d: 21, v: 2.8, window: 'reis-derby', verdict: 'no-ejection' },
    { name: 'glycol, 21 µm, just fast enough', fluid: GLYCOL_25C, d: 21, v: 2.9, window: 'reis-derby', verdict: 'jettable' },
    // REFERENCES §1.4: glycol at 50 µm has K = 13.76 at 6 m/s; K ∝ v^1.25, so K = 62 > 50 at 20 m/s
    // (splash onset We^½·Re^¼ > 50, Derby 2010 restating Stow & Hadfield 1981)
    { name: 'glycol, 50 µm, 20 m/s', fluid: GLYCOL_25C, d: 50, v: 20, window: 'reis-derby', verdict: 'splashing' },
    // Jettable when no speed is known: only Z is judged (Reis & Derby 2000)
    { name: 'glycol, 21 µm, no speed', fluid: GLYCOL_25C, d: 21, v: undefined, window: 'reis-derby', verdict: 'jettable' },
  ] as const)('when $name is judged on $window, then the verdict is $verdict', ({ fluid, d, v, window, verdict }) => {
    const r = jettability({ ...fluid, nozzleDiameterUm: d, dropVelocityMetresPerSecond: v, window });
    expect(r.verdict).toBe(verdict);
  });

  it('when Z is too low and We is too low too, then too-viscous wins and both reasons are listed', () => {
    // REFERENCES §1.4 glycol: Z = 2.077 < 4 (Jang, Kim & Moon 2009) and We < 4 below 2.870 m/s
    const r = jettability({
      ...GLYCOL_25C,
      nozzleDiameterUm: 21,
      dropVelocityMetresPerSecond: 2,
      window: 'jang-kim-moon',
    });
    expect(r.verdict).toBe('too-viscous');
    expect(
      r.reasons.some((s) => s.startsWith('Z = 2.08 is below the printable window 4 ≤ Z ≤ 14')),
    ).toBe(true);
    expect(r.reasons.some((s) => s.startsWith('We = 1.94 ≤ 4'))).toBe(true);
  });

  it('when glycerol–water goes through 21 µm at 6 m/s, then the reasons state each finding with its numbers', () => {
    // REFERENCES §1.4: Z = 6.782, We = 12.16, K = 7.691 for 50 wt % glycerol–water through 21 µm
    const r = jettability({
      ...GLYCEROL_WATER_50_20C,
      nozzleDiameterUm: 21,
      dropVelocityMetresPerSecond: 6,
    });
    expect(r.reasons).toHaveLength(3);
    expect(r.reasons[0]).toBe(
      'Z = 6.78 is inside the printable window 1 < Z < 10 (Reis & Derby 2000).',
    );
    expect(r.reasons[1]).toMatch(
      /^We = 12.2 > 4: .*Duineveld et al\. 2002, as cited by Derby 2010/,
    );
    expect(r.reasons[2]).toMatch(/^We\^½·Re\^¼ = 7.69 ≤ 50: .*estimate/);
  });

  it('when no speed is given, then Re, We and K are null and a reason says why', () => {
    // REFERENCES §1.4: glycerol–water 21 µm, Z = 6.782 does not depend on speed
    const r = jettability({ ...GLYCEROL_WATER_50_20C, nozzleDiameterUm: 21 });
    expect([r.reynolds, r.weber, r.splashParameter]).toEqual([null, null, null]);
    expectRelativelyClose(r.z, 6.782, 0.002);
    expect(r.reasons[1]).toMatch(/No jetting speed/);
  });

  it('when the speed arrives as null (a blank form field), then it is treated as not given', () => {
    // REFERENCES §1.4: glycerol–water 21 µm, Z = 6.782 inside 1 < Z < 10 (Reis & Derby 2000)
    const r = jettability({
      ...GLYCEROL_WATER_50_20C,
      nozzleDiameterUm: 21,
      dropVelocityMetresPerSecond: null,
    });
    expect([r.weber, r.verdict]).toEqual([null, 'jettable']);
  });

  it('when judged on the Jang, Kim & Moon window, then the reason flags its unconfirmed length convention', () => {
    // REFERENCES §1.2: Jang, Kim & Moon 2009 length convention not confirmed
    const r = jettability({
      ...GLYCEROL_WATER_50_20C,
      nozzleDiameterUm: 50,
      window: 'jang-kim-moon',
    });
    expect(r.reasons[0]).toMatch(/Jang, Kim & Moon 2009; its length convention is unconfirmed/);
  });
});

describe('jettability: input errors', () => {
  const base = { ...WATER_20C, nozzleDiameterUm: 21, dropVelocityMetresPerSecond: 6 };
  it.each([
    { field: 'viscosityMilliPaS', value: -1 },
    { field: 'viscosityMilliPaS', value: Number.NaN },
    { field: 'viscosityMilliPaS', value: 0 },
    { field: 'surfaceTensionMilliNPerM', value: -72 },
    { field: 'densityKgPerM3', value: Number.POSITIVE_INFINITY },
    { field: 'nozzleDiameterUm', value: 0 },
    { field: 'dropVelocityMetresPerSecond', value: -6 },
    { field: 'window', value: 'fast' },
  ])('when $field is $value, then ProcessInputError names that field', ({ field, value }) => {
    const call = () => jettability({ ...base, [field]: value });
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });
});

describe('jettability: properties', () => {
  it('when the nozzle diameter scales by k, then Z scales by √k (Z = √(ργd)/η)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 200, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (d, k) => {
          const z1 = jettability({ ...GLYCOL_25C, nozzleDiameterUm: d }).z;
          const z2 = jettability({ ...GLYCOL_25C, nozzleDiameterUm: d * k }).z;
          expect(z2 / z1).toBeCloseTo(Math.sqrt(k), 9);
        },
      ),
    );
  });

  it('when any valid fluid is judged, then Oh = √We / Re and K = Oh·Re^(5/4) (REFERENCES §1.1 identities)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 100, noNaN: true }),
        fc.double({ min: 15, max: 80, noNaN: true }),
        fc.double({ min: 700, max: 2000, noNaN: true }),
        fc.double({ min: 5, max: 200, noNaN: true }),
        fc.double({ min: 0.5, max: 20, noNaN: true }),
        (eta, gamma, rho, d, v) => {
          const r = jettability({
            viscosityMilliPaS: eta,
            surfaceTensionMilliNPerM: gamma,
            densityKgPerM3: rho,
            nozzleDiameterUm: d,
            dropVelocityMetresPerSecond: v,
          });
          const re = r.reynolds as number;
          expect(Math.sqrt(r.weber as number) / re / r.ohnesorge).toBeCloseTo(1, 9);
          expect((r.ohnesorge * re ** 1.25) / (r.splashParameter as number)).toBeCloseTo(1, 9);
        },
      ),
    );
  });
});
