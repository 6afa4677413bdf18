import { describe, expect, it } from 'vitest';

import { solidsVolumeFraction } from '../process/film-thickness';
import { expectRelativelyClose } from '../process/test-support';
import { InkPrintabilitySchema, SubstrateWettingSchema } from '../schemas/material-fit.schema';
import {
  inkPrintability,
  inkSolidsVolumeFraction,
  inkWetting,
  substrateSurfaceEnergy,
  substrateWetting,
  type InkForPrinting,
  type InkForWetting,
  type SubstrateForWetting,
} from './material-fit';

// Fluids as the ink under test. Glycerol–water 50 wt % at 20 °C: η 6.00 and ρ 1126 derived in
// REFERENCES §1.3 from models whose constants are from memory; γ ≈ 70 mN/m from memory.
const GLYCEROL_WATER: InkForPrinting = {
  id: 1, name: 'glycerol–water 50 wt %', viscosityMilliPaS: 6.0, surfaceTensionMilliNPerM: 70, densityKgPerM3: 1126,
  solidsWtPercent: 0, solidsDensityKgPerM3: null,
};
// Ethylene glycol 25 °C: η 16.1, γ 47.99 (CRC-attributed data page, REFERENCES §1.3); ρ 1110 from memory.
const GLYCOL: InkForPrinting = {
  id: 2, name: 'ethylene glycol', viscosityMilliPaS: 16.1, surfaceTensionMilliNPerM: 47.99, densityKgPerM3: 1110,
  solidsWtPercent: 0, solidsDensityKgPerM3: null,
};
const printer = (nozzleDiameterUm: number) => ({ id: nozzleDiameterUm, name: `${nozzleDiameterUm} µm head`, nozzleDiameterUm, jettingSpeedMetresPerSecond: 6 });

// Silver 10 490 kg/m³ is a handbook value from memory (REFERENCES §3.1).
const SILVER = 10_490;
// Mixture density of 20 wt % silver in a 1000 kg/m³ carrier, 1/ρ = w/ρs + (1 − w)/ρc (REFERENCES §3.1, [D]).
const SILVER_INK_DENSITY = 1 / (0.2 / SILVER + 0.8 / 1000);

describe('inkSolidsVolumeFraction', () => {
  // prettier-ignore
  it.each([
    // REFERENCES §3.2: 20 wt % Ag in a 1.00 g/cm³ carrier → φv = 0.023280 (±0.1 %), here through the ink's mixture density
    { name: '20 wt % silver in a 1000 kg/m³ carrier', wt: 20, ink: SILVER_INK_DENSITY, solids: SILVER, expected: 0.02328 },
    // REFERENCES §3.1 formula limit: solids as dense as the ink → φv equals the mass fraction
    { name: 'solids as dense as the ink', wt: 35, ink: 1000, solids: 1000, expected: 0.35 },
    // REFERENCES §3.1 formula limit: no solids → 0
    { name: 'no solids', wt: 0, ink: 1000, solids: SILVER, expected: 0 },
  ])('when the ink has $name, then φv = $expected', ({ wt, ink, solids, expected }) => {
    const phi = inkSolidsVolumeFraction({ solidsWtPercent: wt, densityKgPerM3: ink, solidsDensityKgPerM3: solids });
    if (expected === 0) expect(phi.value).toBe(0);
    else expectRelativelyClose(phi.value, expected, 0.001);
  });

  it.each([
    { wt: 5, solids: 1800, carrier: 1000 },
    { wt: 60, solids: 2500, carrier: 870 },
    { wt: 30, solids: SILVER, carrier: 1100 },
  ])('when $wt wt % at $solids kg/m³ sits in a $carrier kg/m³ carrier, then it agrees with the mixture form', ({ wt, solids, carrier }) => {
    // REFERENCES §3.1: φv = (w/ρs)/(w/ρs + (1 − w)/ρc); the ink density is that mixture's (algebraic identity)
    const inkDensity = 1 / (wt / 100 / solids + (1 - wt / 100) / carrier);
    const phi = inkSolidsVolumeFraction({ solidsWtPercent: wt, densityKgPerM3: inkDensity, solidsDensityKgPerM3: solids });
    expect(phi.value).toBeCloseTo(solidsVolumeFraction({ solidsWtPercent: wt, solidsDensityKgPerM3: solids, carrierDensityKgPerM3: carrier }), 10);
  });

  it('when the solids density is not recorded, then φv is null and the note says what to record', () => {
    const phi = inkSolidsVolumeFraction({ solidsWtPercent: 30, densityKgPerM3: 1300, solidsDensityKgPerM3: null });
    expect(phi.value).toBeNull();
    expect(phi.note).toMatch(/solids density/);
  });
});

describe('inkPrintability', () => {
  // prettier-ignore
  it.each([
    // REFERENCES §1.4 [D]: glycerol–water through 21 µm at 6 m/s → Z = 6.782, We = 12.16: inside 1 < Z < 10 and 4 ≤ Z ≤ 14
    { ink: GLYCEROL_WATER, d: 21, z: 6.782, we: 12.16, byDefault: 'jettable', byAlternative: 'jettable' },
    // REFERENCES §1.4 [D]: through 50 µm → Z = 10.46, just above 1 < Z < 10, inside 4 ≤ Z ≤ 14
    { ink: GLYCEROL_WATER, d: 50, z: 10.46, we: 28.96, byDefault: 'satellites', byAlternative: 'jettable' },
    // REFERENCES §1.4 [D]: ethylene glycol through 21 µm → Z = 2.077: inside 1 < Z < 10, below 4 ≤ Z ≤ 14
    { ink: GLYCOL, d: 21, z: 2.077, we: 17.49, byDefault: 'jettable', byAlternative: 'too-viscous' },
  ])('when $ink.name goes through $d µm at 6 m/s, then Z = $z, and the windows say $byDefault / $byAlternative', ({ ink, d, z, we, byDefault, byAlternative }) => {
    const fit = inkPrintability(ink, [printer(d)]);
    const [first, second] = fit.printers[0]?.windows ?? [];
    expect(first).toMatchObject({ windowId: 'reis-derby', isDefault: true, label: '1 < Z < 10' });
    expect(second).toMatchObject({ windowId: 'jang-kim-moon', isDefault: false, label: '4 ≤ Z ≤ 14' });
    expectRelativelyClose(first?.result.z ?? null, z, 0.002);
    expectRelativelyClose(first?.result.weber ?? null, we, 0.002);
    expect(second?.result.z).toBe(first?.result.z);
    expect(first?.result.verdict).toBe(byDefault);
    expect(second?.result.verdict).toBe(byAlternative);
  });

  it('when there are several printers, then each gets its own row in the order given and the output parses', () => {
    const fit = inkPrintability(GLYCEROL_WATER, [printer(50), printer(21)]);
    expect(fit.printers.map((p) => p.nozzleDiameterUm)).toEqual([50, 21]);
    expect(InkPrintabilitySchema.parse(fit)).toEqual(fit);
  });

  it('when a stored printer has a jetting speed of 0, then its row names the problem and the other printers are still judged', () => {
    // A record saved before a rule existed must not hide every other printer's verdict.
    const fit = inkPrintability(GLYCEROL_WATER, [{ ...printer(21), jettingSpeedMetresPerSecond: 0 }, printer(50)]);
    expect(fit.printers[0]).toMatchObject({ windows: [], problem: expect.stringContaining('Drop velocity (m/s)') });
    expect(fit.printers[1]?.problem).toBeNull();
    expect(fit.printers[1]?.windows).toHaveLength(2);
  });

  it('when there are no printers, then the list is empty but φv is still given', () => {
    const fit = inkPrintability({ ...GLYCEROL_WATER, solidsWtPercent: 20, densityKgPerM3: SILVER_INK_DENSITY, solidsDensityKgPerM3: SILVER }, []);
    expect(fit.printers).toEqual([]);
    expect(fit.solidsVolumeFraction).toBeCloseTo(0.02328, 4); // REFERENCES §3.2
  });
});

const surface = (change: Partial<SubstrateForWetting>): SubstrateForWetting => ({
  id: 7, name: 'film', surfaceEnergyDispersiveMilliNPerM: null, surfaceEnergyPolarMilliNPerM: null,
  waterContactAngleDeg: null, diiodomethaneContactAngleDeg: null, ...change,
});

describe('substrateSurfaceEnergy', () => {
  // prettier-ignore
  it.each([
    // REFERENCES §2.3 [D]: θW = 72.5°, θD = 27.0° → 45.414 + 4.945 = 50.359 mN/m (OWRK, Owens & Wendt 1969)
    { name: 'only contact angles', change: { waterContactAngleDeg: 72.5, diiodomethaneContactAngleDeg: 27 }, source: 'owrk-contact-angles', d: 45.414, p: 4.945, total: 50.359 },
    // Recorded parts are used as given (sum only)
    { name: 'only parts', change: { surfaceEnergyDispersiveMilliNPerM: 38, surfaceEnergyPolarMilliNPerM: 6 }, source: 'recorded-parts', d: 38, p: 6, total: 44 },
    { name: 'parts and angles', change: { surfaceEnergyDispersiveMilliNPerM: 38, surfaceEnergyPolarMilliNPerM: 6, waterContactAngleDeg: 72.5, diiodomethaneContactAngleDeg: 27 }, source: 'recorded-parts', d: 38, p: 6, total: 44 },
  ])('when the substrate has $name, then the energy comes from $source', ({ change, source, d, p, total }) => {
    const { energy } = substrateSurfaceEnergy(surface(change));
    expect(energy?.source).toBe(source);
    expect(energy?.dispersiveMilliNPerM).toBeCloseTo(d, 1);
    expect(energy?.polarMilliNPerM).toBeCloseTo(p, 1);
    expect(energy?.totalMilliNPerM).toBeCloseTo(total, 1);
  });

  it.each([
    { name: 'nothing recorded', change: {}, note: /contact angles/ },
    { name: 'parts of 0 mN/m', change: { surfaceEnergyDispersiveMilliNPerM: 0, surfaceEnergyPolarMilliNPerM: 0 }, note: /not physical/ },
    { name: 'a stored water angle of 200°', change: { waterContactAngleDeg: 200, diiodomethaneContactAngleDeg: 30 }, note: /Water angle \(°\)/ },
  ])('when the substrate has $name, then the energy is null with a reason', ({ change, note }) => {
    const result = substrateSurfaceEnergy(surface(change));
    expect(result.energy).toBeNull();
    expect(result.note).toMatch(note);
  });
});

const PET_LIKE = { source: 'recorded-parts' as const, dispersiveMilliNPerM: 45.414, polarMilliNPerM: 4.945, totalMilliNPerM: 50.359 };
const liquid = (name: string, d: number | null, p: number | null, total: number): InkForWetting => ({
  id: total, name, surfaceTensionMilliNPerM: total, surfaceTensionDispersiveMilliNPerM: d, surfaceTensionPolarMilliNPerM: p,
});

describe('inkWetting', () => {
  // prettier-ignore
  it.each([
    // REFERENCES §2.3 [D]: ink 28.0 = 26.0 + 2.0 on the PET-like solid → cos θ = 1.679 ≥ 1 → spreads (0°); margin 22.359
    { ink: liquid('28 mN/m ink', 26, 2, 28), margin: 22.359, ok: true, angle: 0 },
    // REFERENCES §2.3 [D]: ethylene glycol 48.0 = 29.0 + 19.0 → θ = 23.65°; margin 2.359 < 10 (common practice, no source)
    { ink: liquid('ethylene glycol', 29, 19, 48), margin: 2.359, ok: false, angle: 23.65 },
    // REFERENCES §2.3 [D]: water 72.8 = 21.8 + 51.0 reproduces its input angle 72.50°; margin negative
    { ink: liquid('water', 21.8, 51, 72.8), margin: -22.441, ok: false, angle: 72.5 },
    // No parts recorded: the margin still comes from the totals, no angle
    { ink: liquid('ink without parts', null, null, 30), margin: 20.359, ok: true, angle: null },
  ])('when $ink.name meets the PET-like surface, then margin $margin (ok: $ok) and angle $angle', ({ ink, margin, ok, angle }) => {
    const result = inkWetting(ink, PET_LIKE);
    expect(result.margin?.marginMilliNPerM).toBeCloseTo(margin, 2);
    expect(result.margin?.ok).toBe(ok);
    if (angle === null) expect(result.predictedContactAngleDeg).toBeNull();
    else expect(result.predictedContactAngleDeg).toBeCloseTo(angle, 1);
    expect(result.reasons.length).toBe(2);
  });

  it('when the margin equals the 10 mN/m asked for, then it passes (common practice, no source)', () => {
    const result = inkWetting(liquid('40 mN/m ink', null, null, 40), { ...PET_LIKE, dispersiveMilliNPerM: 45, polarMilliNPerM: 5, totalMilliNPerM: 50 });
    expect(result.margin).toEqual({ marginMilliNPerM: 10, ok: true });
  });

  it('when a stored ink has a surface tension of 0, then its row names the problem instead of failing the view', () => {
    const result = inkWetting(liquid('broken ink', null, null, 0), PET_LIKE);
    expect(result).toMatchObject({ margin: null, predictedContactAngleDeg: null });
    expect(result.reasons[0]).toMatch(/Ink surface tension \(mN\/m\)/);
  });

  it('when the surface energy is unknown, then margin and angle are null with a reason', () => {
    const result = inkWetting(liquid('water', 21.8, 51, 72.8), null);
    expect(result).toMatchObject({ margin: null, predictedContactAngleDeg: null });
    expect(result.reasons[0]).toMatch(/unknown/);
  });
});

describe('substrateWetting', () => {
  it('when a substrate with contact angles meets two inks, then each ink gets a row and the output parses', () => {
    // REFERENCES §2.3 [D]: 72.5° / 27.0° → 50.359 mN/m; ink 28.0 = 26.0 + 2.0 spreads
    const result = substrateWetting(surface({ waterContactAngleDeg: 72.5, diiodomethaneContactAngleDeg: 27 }), [
      liquid('28 mN/m ink', 26, 2, 28),
      liquid('ink without parts', null, null, 45),
    ]);
    expect(result.surfaceEnergy?.totalMilliNPerM).toBeCloseTo(50.359, 1);
    expect(result.surfaceEnergyNote).toMatch(/OWRK/);
    expect(result.requiredMarginMilliNPerM).toBe(10);
    expect(result.inks.map((i) => i.margin?.ok)).toEqual([true, false]);
    expect(result.inks[0]?.predictedContactAngleDeg).toBe(0);
    expect(SubstrateWettingSchema.parse(result)).toEqual(result);
  });

  it('when a stricter margin is asked for, then it is used for every ink', () => {
    const result = substrateWetting(surface({ surfaceEnergyDispersiveMilliNPerM: 45, surfaceEnergyPolarMilliNPerM: 5 }), [liquid('ink', null, null, 38)], 15);
    expect(result.inks[0]?.margin).toEqual({ marginMilliNPerM: 12, ok: false });
  });
});
