import type { HeatSourceView, Ink, Printer, Substrate, SurfaceTreaterView } from '@tracewright/shared';

import type { ProcessRecords } from '../api/get-process-records';

// Invented demo values for the builder's tests only: a plausible bench, never a check value.

const RECORD = { version: 1, archived: false, updatedAt: '2026-11-20T08:00:00Z' };
const NOT_TRACKED = { state: 'not-tracked' as const, message: 'No calibration date on record.' };

export const DEMO_SILVER: Ink = {
  ...RECORD,
  id: 1,
  name: 'Demo silver ink',
  manufacturer: 'Invented Inks',
  function: 'conductor',
  viscosityMilliPaS: 12,
  surfaceTensionMilliNPerM: 32,
  surfaceTensionDispersiveMilliNPerM: 28,
  surfaceTensionPolarMilliNPerM: 4,
  densityKgPerM3: 1600,
  solidsWtPercent: 35,
  solidsDensityKgPerM3: 10_500,
  sheetResistanceOhmPerSq: 0.06,
  tcrPerK: null,
  cureReferenceTempC: 120,
  cureReferenceMinutes: 30,
  activationEnergyKJPerMol: 75,
  minEffectiveCureTempC: 90,
  potLifeHours: null,
  storageNotes: '',
  solvents: [],
  notes: '',
};

export const DEMO_PET: Substrate = {
  ...RECORD,
  id: 1,
  name: 'Demo PET film',
  manufacturer: 'Invented Films',
  substrateClass: 'pet-film',
  thicknessUm: 125,
  surfaceEnergyDispersiveMilliNPerM: 40,
  surfaceEnergyPolarMilliNPerM: 8,
  waterContactAngleDeg: null,
  diiodomethaneContactAngleDeg: null,
  maxContinuousTempC: 140,
  maxShortExposureTempC: 170,
  maxShortExposureSeconds: 60,
  maxStrainPercent: null,
  isTransferCarrier: false,
  notes: '',
};

export const DEMO_PRINTER: Printer = {
  ...RECORD,
  id: 1,
  name: 'Desk printer A',
  model: 'Invented DP-1',
  nozzleDiameterUm: 21,
  dropVolumePl: 10,
  jettingSpeedMetresPerSecond: 6,
  nativeDpi: 1000,
  channels: [
    { name: 'C1', inkId: 1 },
    { name: 'C2', inkId: null },
  ],
  notes: '',
};

export const DEMO_OVEN: HeatSourceView = { ...RECORD, id: 1, name: 'Oven B', kind: 'oven', maxTempC: 250, calibrationDueOn: null, notes: '', status: NOT_TRACKED };

export const DEMO_PLASMA: SurfaceTreaterView = { ...RECORD, id: 1, name: 'Plasma wand D', method: 'plasma', calibrationDueOn: null, notes: '', status: NOT_TRACKED };

export const DEMO_RECORDS: ProcessRecords = {
  inks: [DEMO_SILVER],
  substrates: [DEMO_PET],
  printers: [DEMO_PRINTER],
  heatSources: [DEMO_OVEN],
  surfaceTreaters: [DEMO_PLASMA],
};
