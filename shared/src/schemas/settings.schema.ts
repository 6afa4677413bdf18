import { z } from 'zod';

import { textField } from './common.schema';

export const PAPER_SIZES = ['A4', 'Letter'] as const;

/** IANA zone names are checked by the runtime's Intl, so we never ship our own zone list. */
export const TimeZoneSchema = z
  .string({ error: 'Time zone must be text.' })
  .max(64, 'Time zone can be at most 64 characters.')
  .refine((zone) => {
    try {
      new Intl.DateTimeFormat('en', { timeZone: zone });
      return true;
    } catch {
      return false;
    }
  }, 'Use a time zone name such as Europe/Berlin or America/Chicago.');

export const LabSettingsSchema = z.object({
  labName: textField('Lab name', 120),
  timeZone: TimeZoneSchema,
  paperSize: z.enum(PAPER_SIZES, { error: 'Paper size must be A4 or Letter.' }),
});
export type LabSettings = z.infer<typeof LabSettingsSchema>;
