import type { Ink, Lot, Solvent, Substrate } from '@tracewright/shared';

import type { InkModel } from '../models/ink.model';
import type { MaterialLotModel } from '../models/material-lot.model';
import type { SubstrateModel } from '../models/substrate.model';
import { parseJsonColumn, recordFields } from './catalogue-dto';

export const toInkDto = (row: InkModel): Ink => ({
  name: row.name,
  manufacturer: row.manufacturer,
  function: row.function,
  viscosityMilliPaS: row.viscosityMilliPaS,
  surfaceTensionMilliNPerM: row.surfaceTensionMilliNPerM,
  surfaceTensionDispersiveMilliNPerM: row.surfaceTensionDispersiveMilliNPerM,
  surfaceTensionPolarMilliNPerM: row.surfaceTensionPolarMilliNPerM,
  densityKgPerM3: row.densityKgPerM3,
  solidsWtPercent: row.solidsWtPercent,
  solidsDensityKgPerM3: row.solidsDensityKgPerM3,
  sheetResistanceOhmPerSq: row.sheetResistanceOhmPerSq,
  tcrPerK: row.tcrPerK,
  cureReferenceTempC: row.cureReferenceTempC,
  cureReferenceMinutes: row.cureReferenceMinutes,
  activationEnergyKJPerMol: row.activationEnergyKJPerMol,
  minEffectiveCureTempC: row.minEffectiveCureTempC,
  potLifeHours: row.potLifeHours,
  storageNotes: row.storageNotes,
  solvents: parseJsonColumn<Solvent[]>(row.solvents, []),
  notes: row.notes,
  ...recordFields(row),
});

export const toSubstrateDto = (row: SubstrateModel): Substrate => ({
  name: row.name,
  manufacturer: row.manufacturer,
  substrateClass: row.substrateClass,
  thicknessUm: row.thicknessUm,
  surfaceEnergyDispersiveMilliNPerM: row.surfaceEnergyDispersiveMilliNPerM,
  surfaceEnergyPolarMilliNPerM: row.surfaceEnergyPolarMilliNPerM,
  waterContactAngleDeg: row.waterContactAngleDeg,
  diiodomethaneContactAngleDeg: row.diiodomethaneContactAngleDeg,
  maxContinuousTempC: row.maxContinuousTempC,
  maxShortExposureTempC: row.maxShortExposureTempC,
  maxShortExposureSeconds: row.maxShortExposureSeconds,
  maxStrainPercent: row.maxStrainPercent,
  isTransferCarrier: Boolean(row.isTransferCarrier),
  notes: row.notes,
  ...recordFields(row),
});

/** A lot without its material's name: what the audit trail keeps. */
export const toLotRecord = (row: MaterialLotModel): Omit<Lot, 'materialName'> => ({
  materialType: row.materialType,
  materialId: row.materialId,
  lotNumber: row.lotNumber,
  receivedOn: row.receivedOn,
  openedOn: row.openedOn,
  expiresOn: row.expiresOn,
  notes: row.notes,
  ...recordFields(row),
});
