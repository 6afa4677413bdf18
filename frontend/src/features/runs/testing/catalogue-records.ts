import type { HeatSourceView, Ink, InstrumentView, LotView, Printer, Substrate, SurfaceTreaterView } from '@tracewright/shared';

// Invented records for the runs feature's tests only; never used as check values.

const RECORD = { version: 1, archived: false, updatedAt: '2026-11-20T08:00:00Z' };
const CALIBRATED = { state: 'ok', message: 'Calibrated; next due 2027-06-01.' } as const;

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
    name: 'Clear PET 125',
    manufacturer: 'Film Works',
    substrateClass: 'pet-film',
    thicknessUm: 125,
    surfaceEnergyDispersiveMilliNPerM: null,
    surfaceEnergyPolarMilliNPerM: null,
    waterContactAngleDeg: 70,
    diiodomethaneContactAngleDeg: 35,
    maxContinuousTempC: 150,
    maxShortExposureTempC: 180,
    maxShortExposureSeconds: 60,
    maxStrainPercent: 3,
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
    expiresOn: '2099-05-01',
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
    channels: [{ name: 'C1', inkId: 1 }],
    notes: '',
    ...RECORD,
    ...overrides,
  };
}

export function aHeatSource(overrides: Partial<HeatSourceView> = {}): HeatSourceView {
  return { id: 1, name: 'Oven A', kind: 'oven', maxTempC: 250, calibrationDueOn: '2099-06-01', notes: '', status: CALIBRATED, ...RECORD, ...overrides };
}

export function aTreater(overrides: Partial<SurfaceTreaterView> = {}): SurfaceTreaterView {
  return { id: 1, name: 'Plasma wand', method: 'plasma', calibrationDueOn: null, notes: '', status: { state: 'not-tracked', message: '' }, ...RECORD, ...overrides };
}

export function anInstrument(overrides: Partial<InstrumentView> = {}): InstrumentView {
  return { id: 1, name: 'Bench meter 1', kind: 'multimeter', serialNumber: 'BM-1', calibrationDueOn: '2099-06-01', notes: '', status: CALIBRATED, ...RECORD, ...overrides };
}
