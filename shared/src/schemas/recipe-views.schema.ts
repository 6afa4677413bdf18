import { z } from 'zod';

import { CheckSummarySchema, ProcessCheckSchema } from '../rules/recipe/process-check';
import { SafetyNoteSchema } from '../rules/recipe/safety-notes';
import { VersionDiffSchema } from '../rules/recipe/version-diff';
import { IdSchema, textField } from './common.schema';
import { VersionSchema } from './number-fields.schema';
import { DraftContentSchema, RecipeInputSchema, VersionStateSchema } from './recipe.schema';
import { SignatureSchema } from './signature.schema';

// Response and input shapes of the recipe endpoints. Times are ISO strings.

export const RecipeUpdateSchema = RecipeInputSchema.extend({ version: VersionSchema });
export type RecipeUpdate = z.infer<typeof RecipeUpdateSchema>;

export const PersonRefSchema = z.object({ id: z.number().int(), name: z.string() });
export type PersonRef = z.infer<typeof PersonRefSchema>;

export const VersionRefSchema = z.object({ id: z.number().int(), number: z.number().int(), state: VersionStateSchema });
export type VersionRef = z.infer<typeof VersionRefSchema>;

/** One recipe in the list: its latest version (any state) and the one operators may run. */
export const RecipeSummarySchema = z.object({
  id: z.number().int(),
  code: z.string(),
  name: z.string(),
  product: z.string(),
  notes: z.string(),
  archived: z.boolean(),
  version: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  latestVersion: VersionRefSchema.nullable(),
  releasedVersion: VersionRefSchema.nullable(),
});
export type RecipeSummary = z.infer<typeof RecipeSummarySchema>;
export const RecipeListSchema = z.object({ recipes: z.array(RecipeSummarySchema) });

/** A version in the recipe's history, without its content. */
export const VersionSummarySchema = z.object({
  id: z.number().int(),
  number: z.number().int(),
  state: VersionStateSchema,
  author: PersonRefSchema,
  changeNote: z.string(),
  contentHash: z.string(),
  submittedAt: z.string().nullable(),
  releasedAt: z.string().nullable(),
  releasedBy: PersonRefSchema.nullable(),
  retiredAt: z.string().nullable(),
  reviewComment: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type VersionSummary = z.infer<typeof VersionSummarySchema>;

/** GET /api/recipes/:id — versions newest first. */
export const RecipeDetailSchema = RecipeSummarySchema.extend({ versions: z.array(VersionSummarySchema) });
export type RecipeDetail = z.infer<typeof RecipeDetailSchema>;

export const RecipeTimelineSchema = z.object({
  totalMinutes: z.number(),
  handsOnMinutes: z.number(),
  waitingMinutes: z.number(),
  steps: z.array(z.object({ stepId: z.string(), minutes: z.number(), handsOnMinutes: z.number(), waitingMinutes: z.number() })),
});

/** Cautions derived from what a step does; the step's own notes stay in `content.steps[i].safetyNotes`. */
export const StepSafetyNotesSchema = z.object({ stepId: z.string(), notes: z.array(SafetyNoteSchema) });

/** GET /api/recipe-versions/:id — the content with everything the server computes from it. */
export const RecipeVersionViewSchema = VersionSummarySchema.extend({
  recipeId: z.number().int(),
  recipe: z.object({ id: z.number().int(), code: z.string(), name: z.string(), product: z.string() }),
  content: DraftContentSchema,
  lockVersion: z.number().int(),
  submittedBy: PersonRefSchema.nullable(),
  signature: SignatureSchema.nullable(),
  checks: z.array(ProcessCheckSchema),
  summary: CheckSummarySchema,
  timeline: RecipeTimelineSchema,
  safetyNotes: z.array(StepSafetyNotesSchema),
});
export type RecipeVersionView = z.infer<typeof RecipeVersionViewSchema>;

/** A new draft copies `fromVersionId`, or the released version when none is named. */
export const NewVersionInputSchema = z.object({
  fromVersionId: z.number({ error: 'fromVersionId must be a version id.' }).int().positive().nullable().optional(),
});
export type NewVersionInput = z.infer<typeof NewVersionInputSchema>;

export const SendBackInputSchema = z.object({ comment: textField('Comment', 4000) });
export type SendBackInput = z.infer<typeof SendBackInputSchema>;

export const VersionDiffQuerySchema = z.object({ against: IdSchema });

/** What changed from `from` (the `against` version) to `to` (the version in the path). */
export const VersionDiffViewSchema = z.object({ from: VersionRefSchema, to: VersionRefSchema, diff: VersionDiffSchema });
export type VersionDiffView = z.infer<typeof VersionDiffViewSchema>;
