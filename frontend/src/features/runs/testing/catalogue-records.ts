import type { HeatSourceView, InstrumentView, LotView, Printer, Substrate, SurfaceTreaterView } from '@tracewright/shared';

import { aLot as aCatalogueLot, aPrinter as aCataloguePrinter, aSubstrate as aCatalogueSubstrate, RECORD } from '../../../../test/catalogue-records';

export { anInk } from '../../../../test/catalogue-records';

// Invented records for the runs feature's tests only; never used as check values.
// The shared builders with this feature's defaults: the run fixtures print on a rigid PET film rated
// for their 150 °C cure, with lots far from expiry and the printer channel their recipe names (C1).

const CLEAR_PET: Partial<Substrate> = {
  name: 'Clear PET 125',
  substrateClass: 'pet-film',
  thicknessUm: 125,
  waterContactAngleDeg: 70,
  diiodomethaneContactAngleDeg: 35,
  maxContinuousTempC: 150,
  maxShortExposureTempC: 180,
  maxShortExposureSeconds: 60,
  maxStrainPercent: 3,
};

const CALIBRATED = { state: 'ok', message: 'Calibrated; next due 2027-06-01.' } as const;

export function aSubstrate(overrides: Partial<Substrate> = {}): Substrate {
  return aCatalogueSubstrate({ ...CLEAR_PET, ...overrides });
}

export function aLot(overrides: Partial<LotView> = {}): LotView {
  return aCatalogueLot({ expiresOn: '2099-05-01', ...overrides });
}

export function aPrinter(overrides: Partial<Printer> = {}): Printer {
  return aCataloguePrinter({ channels: [{ name: 'C1', inkId: 1 }], ...overrides });
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
