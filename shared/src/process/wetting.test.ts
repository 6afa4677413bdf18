import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { DIIODOMETHANE_PROBE, OWRK_PROBE_LIQUIDS, WATER_PROBE } from './probe-liquids';
import { ProcessInputError } from './process-input-error';
import {
  owrkInterfacialTensionMilliNPerM,
  owrkSurfaceEnergy,
  predictedContactAngleDeg,
  workOfAdhesionMilliJPerM2,
} from './wetting';

// REFERENCES §2.3 worked examples use water 72.8/21.8/51.0 and diiodomethane 50.8/50.8/0 (§2.2;
// attribution to Ström, Fredriksson & Stenius 1987 from memory). Tolerance ±0.05 mN/m and ±0.05°.
const PET_LIKE = { dispersiveMilliNPerM: 45.414, polarMilliNPerM: 4.945 };

describe('owrkSurfaceEnergy', () => {
  it.each([
    // REFERENCES §2.3: θW = 72.5°, θD = 27.0° → 45.414 + 4.945 = 50.359 mN/m (Owens & Wendt 1969 method)
    { water: 72.5, dim: 27, dispersive: 45.414, polar: 4.945, total: 50.359 },
  ])(
    'when water is $water° and diiodomethane $dim°, then γS = $dispersive + $polar = $total mN/m',
    ({ water, dim, dispersive, polar, total }) => {
      const r = owrkSurfaceEnergy({ waterAngleDeg: water, diiodomethaneAngleDeg: dim });
      expect(r.dispersiveMilliNPerM).toBeCloseTo(dispersive, 1);
      expect(r.polarMilliNPerM).toBeCloseTo(polar, 1);
      expect(r.totalMilliNPerM).toBeCloseTo(total, 1);
    },
  );

  it('when water beads more than the dispersive part explains, then polar is 0 and total equals dispersive', () => {
    // OWRK closed form (REFERENCES §2.1): θD = 20° gives γS^d ≈ 47.8, and at θW = 110° the water
    // term γW(1 + cos θW)/2 ≈ 23.9 is below √(γS^d·γW^d) ≈ 32.3, so the polar root is negative
    const r = owrkSurfaceEnergy({ waterAngleDeg: 110, diiodomethaneAngleDeg: 20 });
    expect(r.polarMilliNPerM).toBe(0);
    expect(r.totalMilliNPerM).toBe(r.dispersiveMilliNPerM);
    expect(r.dispersiveMilliNPerM).toBeGreaterThan(40);
  });

  it('when only the water angle changes, then the dispersive part stays (diiodomethane alone sets it)', () => {
    // REFERENCES §2.1: √γS^d = γD(1 + cos θD)/(2√γD^d) does not involve water
    const a = owrkSurfaceEnergy({ waterAngleDeg: 40, diiodomethaneAngleDeg: 27 });
    const b = owrkSurfaceEnergy({ waterAngleDeg: 80, diiodomethaneAngleDeg: 27 });
    expect(a.dispersiveMilliNPerM).toBe(b.dispersiveMilliNPerM);
    expect(a.polarMilliNPerM).toBeGreaterThan(b.polarMilliNPerM);
  });

  it.each([
    { field: 'waterAngleDeg', value: 181 },
    { field: 'waterAngleDeg', value: -1 },
    { field: 'waterAngleDeg', value: Number.NaN },
    { field: 'diiodomethaneAngleDeg', value: 200 },
  ])('when $field is $value, then ProcessInputError names it', ({ field, value }) => {
    const call = () =>
      owrkSurfaceEnergy({ waterAngleDeg: 70, diiodomethaneAngleDeg: 30, [field]: value });
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });
});

describe('predictedContactAngleDeg', () => {
  // prettier-ignore
  it.each([
    // REFERENCES §2.3 round trip: the PET-like solid reproduces its input angles 72.50° / 27.00°
    { name: 'water on the PET-like solid', liquid: WATER_PROBE, solid: PET_LIKE, expected: 72.5 },
    { name: 'diiodomethane on the PET-like solid', liquid: DIIODOMETHANE_PROBE, solid: PET_LIKE, expected: 27.0 },
    // REFERENCES §2.3: water on a PTFE-like apolar solid 18.0 mN/m → cos θ = −0.45579, θ = 117.12°
    { name: 'water on a PTFE-like solid', liquid: WATER_PROBE, solid: { dispersiveMilliNPerM: 18, polarMilliNPerM: 0 }, expected: 117.12 },
    // REFERENCES §2.3: ethylene glycol 48.0 = 29.0 + 19.0 (§2.2, public codebases) → 23.65°
    { name: 'ethylene glycol on the PET-like solid', liquid: { dispersiveMilliNPerM: 29, polarMilliNPerM: 19 }, solid: PET_LIKE, expected: 23.65 },
    // REFERENCES §2.3: ink 28.0 = 26.0 + 2.0 gives cos θ = 1.679 ≥ 1 → spreads, θ = 0°
    { name: 'a 28 mN/m ink on the PET-like solid', liquid: { dispersiveMilliNPerM: 26, polarMilliNPerM: 2 }, solid: PET_LIKE, expected: 0 },
    // REFERENCES §2.1 reverse rule: cos θ ≤ −1 → 180°; a solid with no surface energy gives cos θ = −1
    { name: 'water on a zero-energy solid', liquid: WATER_PROBE, solid: { dispersiveMilliNPerM: 0, polarMilliNPerM: 0 }, expected: 180 },
  ])('when predicting $name, then θ = $expected°', ({ liquid, solid, expected }) => {
    expect(predictedContactAngleDeg({ liquid, solid })).toBeCloseTo(expected, 1);
  });

  it.each([
    {
      field: 'liquid.polarMilliNPerM',
      liquid: { dispersiveMilliNPerM: 20, polarMilliNPerM: -1 },
      solid: PET_LIKE,
    },
    {
      field: 'liquid.totalMilliNPerM',
      liquid: { dispersiveMilliNPerM: 0, polarMilliNPerM: 0 },
      solid: PET_LIKE,
    },
    {
      field: 'solid.dispersiveMilliNPerM',
      liquid: WATER_PROBE,
      solid: { dispersiveMilliNPerM: Number.NaN, polarMilliNPerM: 0 },
    },
  ])('when $field is not physical, then ProcessInputError names it', ({ field, liquid, solid }) => {
    const call = () => predictedContactAngleDeg({ liquid, solid });
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });

  it('when a solid is computed from predicted angles, then OWRK gives the same solid back (round trip)', () => {
    // REFERENCES §2.3 round-trip check, generalised over solids that neither probe fully wets
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 48, noNaN: true }),
        fc.double({ min: 0, max: 30, noNaN: true }),
        (dispersive, polar) => {
          const solid = { dispersiveMilliNPerM: dispersive, polarMilliNPerM: polar };
          const back = owrkSurfaceEnergy({
            waterAngleDeg: predictedContactAngleDeg({ liquid: OWRK_PROBE_LIQUIDS.water, solid }),
            diiodomethaneAngleDeg: predictedContactAngleDeg({
              liquid: OWRK_PROBE_LIQUIDS.diiodomethane,
              solid,
            }),
          });
          expect(back.dispersiveMilliNPerM).toBeCloseTo(dispersive, 6);
          expect(back.polarMilliNPerM).toBeCloseTo(polar, 6);
        },
      ),
    );
  });

  it('when angles give a solid, then predicting the probes on it gives the angles back (round trip)', () => {
    // REFERENCES §2.3 round trip; water angles limited so the polar root stays positive
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 85, noNaN: true }),
        fc.double({ min: 5, max: 80, noNaN: true }),
        (waterAngleDeg, diiodomethaneAngleDeg) => {
          const solid = owrkSurfaceEnergy({ waterAngleDeg, diiodomethaneAngleDeg });
          fc.pre(solid.polarMilliNPerM > 0);
          expect(predictedContactAngleDeg({ liquid: WATER_PROBE, solid })).toBeCloseTo(
            waterAngleDeg,
            6,
          );
          expect(predictedContactAngleDeg({ liquid: DIIODOMETHANE_PROBE, solid })).toBeCloseTo(
            diiodomethaneAngleDeg,
            6,
          );
        },
      ),
    );
  });
});

describe('owrkInterfacialTensionMilliNPerM and workOfAdhesionMilliJPerM2', () => {
  it('when water meets the PET-like solid, then γSL = 28.468 mN/m', () => {
    // REFERENCES §2.3: γSL = 28.468 mN/m (OWRK geometric mean, Owens & Wendt 1969)
    expect(owrkInterfacialTensionMilliNPerM({ liquid: WATER_PROBE, solid: PET_LIKE })).toBeCloseTo(
      28.468,
      1,
    );
  });

  it.each([
    // REFERENCES §2.3: Wa = 94.691 mJ/m² for water at 72.5° (Young–Dupré)
    { gamma: 72.8, theta: 72.5, expected: 94.691 },
    // Young–Dupré limits: complete wetting doubles γL, 180° gives no adhesion
    { gamma: 72.8, theta: 0, expected: 145.6 },
    { gamma: 72.8, theta: 180, expected: 0 },
  ])('when γL = $gamma at θ = $theta°, then Wa = $expected mJ/m²', ({ gamma, theta, expected }) => {
    const wa = workOfAdhesionMilliJPerM2({
      liquidSurfaceTensionMilliNPerM: gamma,
      contactAngleDeg: theta,
    });
    expect(wa).toBeCloseTo(expected, 1);
  });

  it('when the PET-like solid is used, then Young holds: γS − γSL = γL·cos θ', () => {
    // REFERENCES §2.1: Young γSV = γSL + γLV cos θ, with §2.3's θ = 72.5° for water
    const gammaSL = owrkInterfacialTensionMilliNPerM({ liquid: WATER_PROBE, solid: PET_LIKE });
    const total = PET_LIKE.dispersiveMilliNPerM + PET_LIKE.polarMilliNPerM;
    expect(total - gammaSL).toBeCloseTo(72.8 * Math.cos((72.5 * Math.PI) / 180), 1);
  });
});
