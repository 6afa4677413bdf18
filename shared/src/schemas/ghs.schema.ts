import { z } from 'zod';

import { textField } from './common.schema';

export const GHS_PICTOGRAMS = ['GHS01', 'GHS02', 'GHS03', 'GHS04', 'GHS05', 'GHS06', 'GHS07', 'GHS08', 'GHS09'] as const;
export const GhsPictogramSchema = z.enum(GHS_PICTOGRAMS, { error: 'Pictogram codes run from GHS01 to GHS09.' });
export type GhsPictogram = z.infer<typeof GhsPictogramSchema>;

/** GHS hazard statement codes: H2xx physical, H3xx health, H4xx environment (UN GHS Annex 3); EU adds EUHxxx. */
export const HazardCodeSchema = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^(H[234]\d{2}[A-Z]{0,2}|EUH\d{3}[A-Z]?)$/, 'Hazard codes look like H225, H319 or EUH066.');

export const SolventSchema = z.object({
  name: textField('Solvent name', 120),
  casNumber: z
    .string()
    .trim()
    .regex(/^\d{2,7}-\d{2}-\d$/, 'CAS numbers look like 64-17-5.')
    .nullable()
    .default(null),
  hazardCodes: z.array(HazardCodeSchema).max(30, 'At most 30 hazard codes.').default([]),
  pictograms: z.array(GhsPictogramSchema).max(9).default([]),
  signalWord: z.enum(['Danger', 'Warning']).nullable().default(null),
});
export type Solvent = z.infer<typeof SolventSchema>;
