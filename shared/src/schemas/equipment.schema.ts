import { z } from 'zod';

import { optionalText, textField } from './common.schema';
import { optionalIsoDate, quantity, VersionSchema } from './number-fields.schema';

const withRecordFields = <T extends z.ZodRawShape>(shape: T) =>
  z.object(shape).extend({ id: z.number().int(), version: z.number().int(), archived: z.boolean(), updatedAt: z.string() });

export const ChannelSchema = z.object({
  name: textField('Channel name', 30),
  inkId: z.number().int().positive().nullable().default(null),
});

const printerFields = z.object({
  name: textField('Name', 120),
  model: optionalText('Model', 120).default(''),
  nozzleDiameterUm: quantity('Nozzle diameter', 'µm', 0, 500, { exclusiveMin: true }),
  dropVolumePl: quantity('Drop volume', 'pL', 0, 1_000, { exclusiveMin: true }),
  jettingSpeedMetresPerSecond: quantity('Typical jetting speed', 'm/s', 0, 50, { exclusiveMin: true }),
  nativeDpi: quantity('Native resolution', 'dpi', 1, 10_000),
  channels: z
    .array(ChannelSchema)
    .min(1, 'A printer has at least one channel.')
    .max(16, 'At most 16 channels.')
    .refine((chs) => new Set(chs.map((c) => c.name.toLowerCase())).size === chs.length, 'Channel names must differ.'),
  notes: optionalText('Notes', 4000).default(''),
});
export const PrinterInputSchema = printerFields;
export type PrinterInput = z.infer<typeof PrinterInputSchema>;
export const PrinterUpdateSchema = printerFields.extend({ version: VersionSchema });
export type PrinterUpdate = z.infer<typeof PrinterUpdateSchema>;
export const PrinterSchema = withRecordFields(printerFields.shape);
export type Printer = z.infer<typeof PrinterSchema>;

export const HEAT_SOURCE_KINDS = ['oven', 'hot-plate', 'heat-press', 'heat-gun'] as const;
const heatSourceFields = z.object({
  name: textField('Name', 120),
  kind: z.enum(HEAT_SOURCE_KINDS, { error: 'Kind is oven, hot plate, heat press or heat gun.' }),
  maxTempC: quantity('Maximum temperature', '°C', 20, 1_000),
  calibrationDueOn: optionalIsoDate,
  notes: optionalText('Notes', 4000).default(''),
});
export const HeatSourceInputSchema = heatSourceFields;
export type HeatSourceInput = z.infer<typeof HeatSourceInputSchema>;
export const HeatSourceUpdateSchema = heatSourceFields.extend({ version: VersionSchema });
export type HeatSourceUpdate = z.infer<typeof HeatSourceUpdateSchema>;
export const HeatSourceSchema = withRecordFields(heatSourceFields.shape);
export type HeatSource = z.infer<typeof HeatSourceSchema>;

export const TREATMENT_METHODS = ['plasma', 'corona', 'uv-ozone', 'primer-coat', 'solvent-wipe'] as const;
export const TreatmentMethodSchema = z.enum(TREATMENT_METHODS, { error: 'Method is plasma, corona, UV-ozone, primer coat or solvent wipe.' });
const treaterFields = z.object({
  name: textField('Name', 120),
  method: TreatmentMethodSchema,
  calibrationDueOn: optionalIsoDate,
  notes: optionalText('Notes', 4000).default(''),
});
export const SurfaceTreaterInputSchema = treaterFields;
export type SurfaceTreaterInput = z.infer<typeof SurfaceTreaterInputSchema>;
export const SurfaceTreaterUpdateSchema = treaterFields.extend({ version: VersionSchema });
export type SurfaceTreaterUpdate = z.infer<typeof SurfaceTreaterUpdateSchema>;
export const SurfaceTreaterSchema = withRecordFields(treaterFields.shape);
export type SurfaceTreater = z.infer<typeof SurfaceTreaterSchema>;

export const INSTRUMENT_KINDS = ['multimeter', 'four-point-probe', 'contact-angle-goniometer', 'thermocouple-logger', 'micrometer', 'microscope', 'other'] as const;
const instrumentFields = z.object({
  name: textField('Name', 120),
  kind: z.enum(INSTRUMENT_KINDS, { error: 'Pick the kind of instrument from the list.' }),
  serialNumber: optionalText('Serial number', 60).default(''),
  calibrationDueOn: optionalIsoDate,
  notes: optionalText('Notes', 4000).default(''),
});
export const InstrumentInputSchema = instrumentFields;
export type InstrumentInput = z.infer<typeof InstrumentInputSchema>;
export const InstrumentUpdateSchema = instrumentFields.extend({ version: VersionSchema });
export type InstrumentUpdate = z.infer<typeof InstrumentUpdateSchema>;
export const InstrumentSchema = withRecordFields(instrumentFields.shape);
export type Instrument = z.infer<typeof InstrumentSchema>;
