import { http, HttpResponse } from 'msw';

import type { Ink, InkPrintability, LotView, Printer, Substrate } from '@tracewright/shared';

// Invented values for tests only; they are never used as check values.

const RECORD = { version: 1, archived: false, updatedAt: '2026-11-20T08:00:00Z' };

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

type Fit = InkPrintability['printers'][number];
type Result = Fit['windows'][number]['result'];

/** One printer's fit, the same numbers under both windows unless told otherwise. */
export function aFit(printer: { id: number; name: string }, result: Partial<Result>, alternative: Partial<Result> = {}): Fit {
  const base: Result = { ohnesorge: 0.15, z: 6.8, reynolds: 24, weber: 12, splashParameter: 7.7, verdict: 'jettable', reasons: [], ...result };
  return {
    printerId: printer.id,
    printerName: printer.name,
    nozzleDiameterUm: 21,
    jettingSpeedMetresPerSecond: 6,
    problem: null,
    windows: [
      { windowId: 'reis-derby', label: '1 < Z < 10', source: 'Reis & Derby 2000', isDefault: true, result: base },
      { windowId: 'jang-kim-moon', label: '4 ≤ Z ≤ 14', source: 'Jang, Kim & Moon 2009', isDefault: false, result: { ...base, ...alternative } },
    ],
  };
}

/** The list endpoints answer with these records (archived ones included, as the page asks for all). */
export function catalogueLists(lists: { inks?: Ink[]; substrates?: Substrate[]; lots?: LotView[]; printers?: Printer[] }) {
  return [
    http.get('/api/inks', () => HttpResponse.json({ inks: lists.inks ?? [] })),
    http.get('/api/substrates', () => HttpResponse.json({ substrates: lists.substrates ?? [] })),
    http.get('/api/lots', () => HttpResponse.json({ lots: lists.lots ?? [] })),
    http.get('/api/printers', () => HttpResponse.json({ printers: lists.printers ?? [] })),
  ];
}
