import type { Ink, LotView, Printer, Substrate } from '@tracewright/shared';

// Invented values for tests only; they are never used as check values.
// One builder per catalogue record, shared by every feature's tests: a feature that needs other
// defaults passes them as overrides, so a field added to a record is filled in once, here.

/** What every stored catalogue record carries besides its own fields. */
export const RECORD = { version: 1, archived: false, updatedAt: '2026-11-20T08:00:00Z' };

export function anInk(overrides: Partial<Ink> = {}): Ink {
  return {
    id: 1,
    name: 'Argent nano A9',
    manufacturer: 'Larkspur Inks',
    function: 'conductor',
    viscosityMilliPaS: 11,
    surfaceTensionMilliNPerM: 31,
    surfaceTensionDispersiveMilliNPerM: null,
    surfaceTensionPolarMilliNPerM: null,
    densityKgPerM3: 1450,
    solidsWtPercent: 30,
    solidsDensityKgPerM3: null,
    sheetResistanceOhmPerSq: 0.08,
    tcrPerK: null,
    cureReferenceTempC: 150,
    cureReferenceMinutes: 30,
    activationEnergyKJPerMol: null,
    minEffectiveCureTempC: null,
    potLifeHours: null,
    storageNotes: '',
    solvents: [],
    notes: '',
    ...RECORD,
    ...overrides,
  };
}

export function aSubstrate(overrides: Partial<Substrate> = {}): Substrate {
  return {
    id: 1,
    name: 'Stretch TPU 50',
    manufacturer: 'Film Works',
    substrateClass: 'tpu-film',
    thicknessUm: 50,
    surfaceEnergyDispersiveMilliNPerM: null,
    surfaceEnergyPolarMilliNPerM: null,
    waterContactAngleDeg: 80,
    diiodomethaneContactAngleDeg: 40,
    maxContinuousTempC: 110,
    maxShortExposureTempC: 140,
    maxShortExposureSeconds: 30,
    maxStrainPercent: 300,
    isTransferCarrier: false,
    notes: '',
    ...RECORD,
    ...overrides,
  };
}

export function aLot(overrides: Partial<LotView> = {}): LotView {
  return {
    id: 1,
    materialType: 'ink',
    materialId: 1,
    materialName: 'Argent nano A9',
    lotNumber: 'AN9-2611',
    receivedOn: '2026-11-01',
    openedOn: null,
    expiresOn: '2027-05-01',
    notes: '',
    status: { flags: [], usable: true, messages: [] },
    ...RECORD,
    ...overrides,
  };
}

export function aPrinter(overrides: Partial<Printer> = {}): Printer {
  return {
    id: 1,
    name: 'Bench jetter',
    model: 'PJ-2',
    nozzleDiameterUm: 21,
    dropVolumePl: 10,
    jettingSpeedMetresPerSecond: 6,
    nativeDpi: 600,
    channels: [{ name: 'A', inkId: 1 }],
    notes: '',
    ...RECORD,
    ...overrides,
  };
}
