import { z } from 'zod';

import { HeatSourceSchema, InstrumentSchema, PrinterSchema, SurfaceTreaterSchema } from './equipment.schema';
import { InkSchema, LotSchema, SubstrateSchema } from './material.schema';
import { VersionSchema } from './number-fields.schema';

/** List filters every material and equipment catalogue shares; by default only records in use. */
export const CatalogueQuerySchema = z.object({
  archived: z.enum(['false', 'true', 'all'], { error: 'archived is false, true or all.' }).default('false'),
  q: z
    .string({ error: 'Search text must be text (send q once).' })
    .trim()
    .max(120, 'Search text can be at most 120 characters.')
    .optional(),
});
export type CatalogueQuery = z.infer<typeof CatalogueQuerySchema>;

/**
 * Archive and restore may name the version the person was looking at; when they do and someone
 * saved since, the request is refused like a stale update.
 */
export const ArchiveInputSchema = z.object({ version: VersionSchema.optional() });
export type ArchiveInput = z.infer<typeof ArchiveInputSchema>;

/** The output of `lotStatus` (rules/material-status.ts). */
export const LotStatusSchema = z.object({
  flags: z.array(z.enum(['expired', 'past-pot-life'])),
  usable: z.boolean(),
  messages: z.array(z.string()),
});

/** The output of `calibrationStatus` (rules/material-status.ts). */
export const CalibrationStatusSchema = z.object({
  state: z.enum(['ok', 'due-soon', 'overdue', 'not-tracked']),
  message: z.string(),
});

// What the API answers: the record plus `status`, worked out for today in the lab's time zone.
export const LotViewSchema = LotSchema.extend({ status: LotStatusSchema });
export type LotView = z.infer<typeof LotViewSchema>;
export const HeatSourceViewSchema = HeatSourceSchema.extend({ status: CalibrationStatusSchema });
export type HeatSourceView = z.infer<typeof HeatSourceViewSchema>;
export const SurfaceTreaterViewSchema = SurfaceTreaterSchema.extend({ status: CalibrationStatusSchema });
export type SurfaceTreaterView = z.infer<typeof SurfaceTreaterViewSchema>;
export const InstrumentViewSchema = InstrumentSchema.extend({ status: CalibrationStatusSchema });
export type InstrumentView = z.infer<typeof InstrumentViewSchema>;

// List responses: one key per catalogue, as `GET /api/users` answers `{ users }`.
export const InkListSchema = z.object({ inks: z.array(InkSchema) });
export const SubstrateListSchema = z.object({ substrates: z.array(SubstrateSchema) });
export const LotListSchema = z.object({ lots: z.array(LotViewSchema) });
export const PrinterListSchema = z.object({ printers: z.array(PrinterSchema) });
export const HeatSourceListSchema = z.object({ heatSources: z.array(HeatSourceViewSchema) });
export const SurfaceTreaterListSchema = z.object({ surfaceTreaters: z.array(SurfaceTreaterViewSchema) });
export const InstrumentListSchema = z.object({ instruments: z.array(InstrumentViewSchema) });
