import {
  calibrationStatus,
  type HeatSourceInput,
  type HeatSourceView,
  type InstrumentInput,
  type InstrumentView,
  type SurfaceTreaterInput,
  type SurfaceTreaterView,
} from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { HeatSourceModel } from '../models/heat-source.model';
import { InstrumentModel } from '../models/instrument.model';
import { SurfaceTreaterModel } from '../models/surface-treater.model';
import { createCatalogue } from './catalogue.service';
import { toHeatSourceDto, toInstrumentDto, toSurfaceTreaterDto } from './equipment-dto';
import { labToday } from './lab-calendar';

// Heat sources, surface treaters and instruments differ only in their fields; all three carry a
// calibration due date whose status everyone sees wherever the equipment appears.

const withCalibration =
  <M extends { calibrationDueOn: string | null }, Dto>(toDto: (row: M) => Dto) =>
  async (ctx: AppContext, rows: M[]) => {
    if (rows.length === 0) return [];
    const today = await labToday(ctx);
    return rows.map((row) => ({ ...toDto(row), status: calibrationStatus(row.calibrationDueOn, today) }));
  };

const byName: [string, string][] = [
  ['name', 'ASC'],
  ['id', 'ASC'],
];

export const heatSourceCatalogue = createCatalogue<HeatSourceModel, HeatSourceInput, HeatSourceView>({
  model: HeatSourceModel,
  entityType: 'heat-source',
  noun: 'heat source',
  searchColumns: ['name'],
  order: byName,
  toColumns: (input) => ({ ...input }),
  toRecord: toHeatSourceDto,
  toViews: withCalibration(toHeatSourceDto),
});

export const surfaceTreaterCatalogue = createCatalogue<SurfaceTreaterModel, SurfaceTreaterInput, SurfaceTreaterView>({
  model: SurfaceTreaterModel,
  entityType: 'surface-treater',
  noun: 'surface treater',
  searchColumns: ['name'],
  order: byName,
  toColumns: (input) => ({ ...input }),
  toRecord: toSurfaceTreaterDto,
  toViews: withCalibration(toSurfaceTreaterDto),
});

export const instrumentCatalogue = createCatalogue<InstrumentModel, InstrumentInput, InstrumentView>({
  model: InstrumentModel,
  entityType: 'instrument',
  noun: 'instrument',
  searchColumns: ['name', 'serialNumber'],
  order: byName,
  toColumns: (input) => ({ ...input }),
  toRecord: toInstrumentDto,
  toViews: withCalibration(toInstrumentDto),
});
