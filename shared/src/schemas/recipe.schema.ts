import { z } from 'zod';

import { optionalText, textField } from './common.schema';
import { VersionSchema } from './number-fields.schema';
import { RecipeStepSchema } from './recipe-step.schema';

export const VERSION_STATES = ['draft', 'in-review', 'released', 'retired'] as const;
export const VersionStateSchema = z.enum(VERSION_STATES);
export type VersionState = z.infer<typeof VersionStateSchema>;

export const RecipeInputSchema = z.object({
  code: z
    .string({ error: 'Code must be text.' })
    .trim()
    .toUpperCase()
    .regex(/^[A-Z0-9][A-Z0-9-]{1,29}$/, 'Codes are 2–30 letters, digits and dashes, like TOUCH-4K.'),
  name: textField('Name', 120),
  product: textField('Product', 120),
  notes: optionalText('Notes', 4000).default(''),
});
export type RecipeInput = z.infer<typeof RecipeInputSchema>;

export const ChannelAssignmentSchema = z.object({
  channel: textField('Channel', 30),
  inkId: z.number({ error: 'Pick the ink for this channel.' }).int().positive(),
});

/** What a version was proven with; a run later binds actual machines and lots. */
export const VersionSetupSchema = z.object({
  substrateId: z.number({ error: 'Pick the print substrate.' }).int().positive().nullable().default(null),
  receivingSubstrateId: z.number().int().positive().nullable().default(null),
  printerId: z.number({ error: 'Pick the printer.' }).int().positive().nullable().default(null),
  channelPlan: z.array(ChannelAssignmentSchema).max(16).default([]),
  heatSourceIds: z.array(z.number().int().positive()).max(20).default([]),
  treaterIds: z.array(z.number().int().positive()).max(20).default([]),
  changeNote: optionalText('What changed', 2000).default(''),
});
export type VersionSetup = z.infer<typeof VersionSetupSchema>;

export const DraftContentSchema = VersionSetupSchema.extend({
  steps: z
    .array(RecipeStepSchema)
    .max(200, 'A recipe can have at most 200 steps.')
    .refine((steps) => new Set(steps.map((s) => s.id)).size === steps.length, 'Step ids must differ.'),
});
export type DraftContent = z.infer<typeof DraftContentSchema>;

/** Saving a draft: the whole content plus the lock version it was based on (stale → 409). */
export const SaveDraftInputSchema = DraftContentSchema.extend({ lockVersion: VersionSchema });
export type SaveDraftInput = z.infer<typeof SaveDraftInputSchema>;
