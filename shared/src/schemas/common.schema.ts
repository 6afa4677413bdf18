import { z } from 'zod';

/** Trimmed single-line text with a clear length limit, so huge strings are refused with a message. */
export const textField = (label: string, max = 200, min = 1) =>
  z
    .string({ error: `${label} must be text.` })
    .trim()
    .min(min, min === 1 ? `${label} is required.` : `${label} needs at least ${min} characters.`)
    .max(max, `${label} can be at most ${max} characters.`);

export const optionalText = (label: string, max = 2000) =>
  z.string({ error: `${label} must be text.` }).trim().max(max, `${label} can be at most ${max} characters.`);

export const EmailSchema = z
  .string({ error: 'E-mail must be text.' })
  .trim()
  .toLowerCase()
  .max(254, 'E-mail can be at most 254 characters.')
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@lab.example.' }));

export const IdSchema = z.coerce
  .number({ error: 'Id must be a number.' })
  .int('Id must be a whole number.')
  .positive('Id must be positive.')
  .max(2_147_483_647, 'Id is too large.');

export const IdParamsSchema = z.object({ id: IdSchema });

/** ISO 8601 timestamp as sent over JSON. */
export const IsoDateTimeSchema = z.iso.datetime({ offset: true });
