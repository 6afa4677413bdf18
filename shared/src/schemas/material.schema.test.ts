import { describe, expect, it } from 'vitest';

import { PrinterInputSchema } from './equipment.schema';
import { InkInputSchema, LotInputSchema, SubstrateInputSchema } from './material.schema';

// Demo-style values (invented): they exercise the rules, not any published property.
const conductor = {
  name: 'Demo silver ink',
  function: 'conductor',
  viscosityMilliPaS: 11,
  surfaceTensionMilliNPerM: 32,
  densityKgPerM3: 1450,
  solidsWtPercent: 30,
  sheetResistanceOhmPerSq: 0.08,
};

const film = {
  name: 'Demo TPU film',
  substrateClass: 'tpu-film',
  thicknessUm: 50,
  maxContinuousTempC: 110,
  maxShortExposureTempC: 150,
  maxShortExposureSeconds: 30,
};

const firstIssue = (r: { success: boolean; error?: { issues: Array<{ path: PropertyKey[]; message: string }> } }) => r.error?.issues[0];

describe('InkInputSchema', () => {
  it('when a conductor has the needed numbers, then optional ones default to null or empty', () => {
    const ink = InkInputSchema.parse(conductor);
    expect(ink.tcrPerK).toBeNull();
    expect(ink.solvents).toEqual([]);
  });
  it.each([
    ['a negative viscosity', { viscosityMilliPaS: -1 }, 'viscosityMilliPaS'],
    ['a NaN surface tension', { surfaceTensionMilliNPerM: Number.NaN }, 'surfaceTensionMilliNPerM'],
    ['no sheet resistance on a conductor', { sheetResistanceOhmPerSq: null }, 'sheetResistanceOhmPerSq'],
    ['parts that do not add up', { surfaceTensionDispersiveMilliNPerM: 20, surfaceTensionPolarMilliNPerM: 2 }, 'surfaceTensionPolarMilliNPerM'],
    ['only one part', { surfaceTensionDispersiveMilliNPerM: 20 }, 'surfaceTensionPolarMilliNPerM'],
    ['a cure time without temperature', { cureReferenceMinutes: 30 }, 'cureReferenceMinutes'],
    ['a bad hazard code', { solvents: [{ name: 'Ethanol', hazardCodes: ['flammable'] }] }, 'solvents'],
  ])('when the ink has %s, then %s is named', (_label, change, field) => {
    const issue = firstIssue(InkInputSchema.safeParse({ ...conductor, ...change }));
    expect(issue?.path[0]).toBe(field);
    expect(issue?.message.length).toBeGreaterThan(5);
  });
  it('when hazard codes are lower case, then they are stored upper case', () => {
    const ink = InkInputSchema.parse({ ...conductor, solvents: [{ name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['h225'], pictograms: ['GHS02'] }] });
    expect(ink.solvents[0]?.hazardCodes).toEqual(['H225']);
  });
});

describe('SubstrateInputSchema', () => {
  it('when the short-exposure limit is below the continuous one, then it is refused', () => {
    expect(firstIssue(SubstrateInputSchema.safeParse({ ...film, maxShortExposureTempC: 100 }))?.path[0]).toBe('maxShortExposureTempC');
  });
  it('when only the water angle is given, then the diiodomethane angle is asked for', () => {
    expect(firstIssue(SubstrateInputSchema.safeParse({ ...film, waterContactAngleDeg: 80 }))?.path[0]).toBe('diiodomethaneContactAngleDeg');
  });
  it('when a contact angle is over 180°, then it is refused', () => {
    expect(SubstrateInputSchema.safeParse({ ...film, waterContactAngleDeg: 181, diiodomethaneContactAngleDeg: 30 }).success).toBe(false);
  });
});

describe('LotInputSchema', () => {
  it.each([
    [{ openedOn: '2026-01-01' }, 'openedOn'],
    [{ expiresOn: '2025-12-31' }, 'expiresOn'],
    [{ receivedOn: '2026-02-30' }, 'receivedOn'],
  ])('when dates are %j, then %s is refused', (change, field) => {
    const base = { materialType: 'ink', materialId: 1, lotNumber: 'AG-001', receivedOn: '2026-03-01' };
    expect(firstIssue(LotInputSchema.safeParse({ ...base, ...change }))?.path[0]).toBe(field);
  });
});

describe('PrinterInputSchema', () => {
  const printer = { name: 'Bench printer', nozzleDiameterUm: 21, dropVolumePl: 10, jettingSpeedMetresPerSecond: 6, nativeDpi: 1270 };
  it('when two channels share a name, then it is refused', () => {
    expect(PrinterInputSchema.safeParse({ ...printer, channels: [{ name: 'C1' }, { name: 'c1' }] }).success).toBe(false);
  });
  it('when channels are given without inks, then they are empty', () => {
    expect(PrinterInputSchema.parse({ ...printer, channels: [{ name: 'C1' }] }).channels[0]?.inkId).toBeNull();
  });
});
