import type { HeatSource, Instrument, Printer, SurfaceTreater } from '@tracewright/shared';

import type { HeatSourceModel } from '../models/heat-source.model';
import type { InstrumentModel } from '../models/instrument.model';
import type { PrinterModel } from '../models/printer.model';
import type { SurfaceTreaterModel } from '../models/surface-treater.model';
import { recordFields } from './catalogue-dto';

/** Needs the row loaded with its channels (`include: 'channels'`). */
export const toPrinterDto = (row: PrinterModel): Printer => ({
  name: row.name,
  model: row.model,
  nozzleDiameterUm: row.nozzleDiameterUm,
  dropVolumePl: row.dropVolumePl,
  jettingSpeedMetresPerSecond: row.jettingSpeedMetresPerSecond,
  nativeDpi: row.nativeDpi,
  channels: [...(row.channels ?? [])].sort((a, b) => a.position - b.position).map((c) => ({ name: c.name, inkId: c.inkId })),
  notes: row.notes,
  ...recordFields(row),
});

export const toHeatSourceDto = (row: HeatSourceModel): HeatSource => ({
  name: row.name,
  kind: row.kind,
  maxTempC: row.maxTempC,
  calibrationDueOn: row.calibrationDueOn,
  notes: row.notes,
  ...recordFields(row),
});

export const toSurfaceTreaterDto = (row: SurfaceTreaterModel): SurfaceTreater => ({
  name: row.name,
  method: row.method,
  calibrationDueOn: row.calibrationDueOn,
  notes: row.notes,
  ...recordFields(row),
});

export const toInstrumentDto = (row: InstrumentModel): Instrument => ({
  name: row.name,
  kind: row.kind,
  serialNumber: row.serialNumber,
  calibrationDueOn: row.calibrationDueOn,
  notes: row.notes,
  ...recordFields(row),
});
