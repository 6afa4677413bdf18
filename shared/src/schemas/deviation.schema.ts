import { z } from 'zod';

import { IdSchema, optionalText, textField } from './common.schema';
import { IsoDateSchema, optionalIsoDate } from './number-fields.schema';
import { StepKindSchema } from './recipe-step.schema';
import { DeviationRuleSchema, DeviationSeveritySchema, DeviationStateSchema } from './run.schema';
import { DeviationSummarySchema } from './run-views.schema';

export const DISPOSITIONS = ['use-as-is', 'rework', 'scrap', 'return-to-supplier'] as const;
export const DispositionSchema = z.enum(DISPOSITIONS, { error: 'Disposition is use as is, rework, scrap or return to supplier.' });
export type Disposition = z.infer<typeof DispositionSchema>;

export const DISPOSITION_LABELS: Record<Disposition, string> = {
  'use-as-is': 'Use as is',
  rework: 'Rework',
  scrap: 'Scrap',
  'return-to-supplier': 'Return to supplier',
};

const csv = <T extends z.ZodType>(item: T) =>
  z.preprocess((v) => (typeof v === 'string' ? v.split(',').filter(Boolean) : v), z.array(item).max(20)).optional();

/** Server-side filtering, sorting and paging of the deviation queue (query string). */
export const DeviationQuerySchema = z.object({
  state: csv(DeviationStateSchema),
  severity: csv(DeviationSeveritySchema),
  rule: csv(DeviationRuleSchema),
  recipeId: z.coerce.number().int().positive().optional(),
  runId: z.coerce.number().int().positive().optional(),
  stepKind: StepKindSchema.optional(),
  operatorId: z.coerce.number().int().positive().optional(),
  from: IsoDateSchema.optional(),
  to: IsoDateSchema.optional(),
  q: z.string().trim().max(100).optional(),
  sort: z.enum(['newest', 'oldest', 'severity']).default('newest'),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type DeviationQuery = z.infer<typeof DeviationQuerySchema>;

export const DeviationQueueItemSchema = DeviationSummarySchema.extend({
  runCode: z.string(),
  recipeCode: z.string(),
  stepKind: StepKindSchema.nullable(),
  stepTitle: z.string().nullable(),
  assignee: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  ageDays: z.number(),
});
export const DeviationQueueSchema = z.object({
  items: z.array(DeviationQueueItemSchema),
  total: z.number().int(),
  countsByState: z.record(z.string(), z.number().int()),
});
export type DeviationQueue = z.infer<typeof DeviationQueueSchema>;

export const AssignDeviationInputSchema = z.object({
  assigneeId: IdSchema,
  severity: DeviationSeveritySchema.optional(),
});

export const CommentInputSchema = z.object({ text: textField('Comment', 4000) });

/** Signing: the person re-enters their password; the meaning is fixed by the action. */
export const SignatureInputSchema = z.object({
  password: z.string({ error: 'Enter your password to sign.' }).min(1, 'Enter your password to sign.').max(200),
  /** The content hash the person reviewed; a changed record since then → 409. */
  contentHash: z.string().regex(/^[a-f0-9]{64}$/).optional(),
});

export const DispositionInputSchema = SignatureInputSchema.extend({
  disposition: DispositionSchema,
  rationale: textField('Rationale', 4000, 10),
  /** Which pieces this disposition covers; empty = all pieces the deviation names. */
  pieceIds: z.array(IdSchema).max(500).default([]),
  /** For rework: the recipe steps to repeat in the linked rework run. */
  reworkStepIds: z.array(z.string().max(40)).max(200).default([]),
  correctiveAction: z
    .object({
      note: textField('Corrective action', 2000),
      ownerId: IdSchema,
      dueOn: IsoDateSchema,
    })
    .nullable()
    .default(null),
});
export type DispositionInput = z.infer<typeof DispositionInputSchema>;

export const CloseDeviationInputSchema = SignatureInputSchema.extend({
  verificationNote: optionalText('Verification', 2000).default(''),
});

export const RunSignOffInputSchema = SignatureInputSchema;

/** A trend over one reading spec of a recipe, across runs. */
export const TrendQuerySchema = z.object({
  recipeId: z.coerce.number().int().positive(),
  specId: z.string().max(40),
  from: optionalIsoDate.optional(),
  to: optionalIsoDate.optional(),
});

export const TrendPointSchema = z.object({
  readingId: z.number().int(),
  runId: z.number().int(),
  runCode: z.string(),
  pieceCode: z.string().nullable(),
  value: z.number(),
  recordedAt: z.string(),
  excluded: z.boolean(),
  annotation: z.string().nullable(),
});

export const TrendPointNoteInputSchema = z.object({
  readingId: IdSchema,
  excluded: z.boolean(),
  reason: textField('Reason', 1000, 3),
});

export const FreezeLimitsInputSchema = z.object({
  recipeId: IdSchema,
  specId: z.string().max(40),
  baselineRunIds: z.array(IdSchema).min(1, 'Pick at least one run for the baseline.').max(500),
  reason: textField('Reason', 1000, 3),
});

const PersonRef = z.object({ id: z.number().int(), name: z.string() }).nullable();

export const DeviationEventSchema = z.object({
  id: z.number().int(),
  at: z.string(),
  by: PersonRef,
  kind: z.enum(['created', 'assigned', 'severity-changed', 'comment', 'dispositioned', 'closed', 'signature-refused']),
  text: z.string(),
});

export const SignatureViewSchema = z.object({
  signedBy: z.string(),
  meaning: z.string(),
  signedAt: z.string(),
  contentHash: z.string(),
});

export const DispositionViewSchema = z.object({
  id: z.number().int(),
  disposition: DispositionSchema,
  rationale: z.string(),
  pieceIds: z.array(z.number().int()),
  reworkRunId: z.number().int().nullable(),
  correctiveAction: z.object({ note: z.string(), owner: PersonRef, dueOn: z.string(), verifiedAt: z.string().nullable() }).nullable(),
  signature: SignatureViewSchema,
});

/** Everything quality needs to decide: what was expected, what happened, and its context. */
export const DeviationDetailSchema = DeviationQueueItemSchema.extend({
  contentHash: z.string(),
  run: z.object({ id: z.number().int(), code: z.string(), state: z.string(), recipeCode: z.string(), versionNumber: z.number().int() }),
  step: z.object({ id: z.string(), kind: StepKindSchema, title: z.string(), number: z.number().int() }).nullable(),
  pieces: z.array(z.object({ id: z.number().int(), code: z.string() })),
  lots: z.array(z.object({ lotId: z.number().int(), lotNumber: z.string(), materialName: z.string() })),
  readings: z.array(z.object({ id: z.number().int(), specName: z.string(), value: z.number(), unit: z.string(), outOfLimits: z.boolean(), recordedAt: z.string() })),
  events: z.array(DeviationEventSchema),
  dispositions: z.array(DispositionViewSchema),
  closure: z.object({ verificationNote: z.string(), signature: SignatureViewSchema }).nullable(),
});
export type DeviationDetail = z.infer<typeof DeviationDetailSchema>;

export const TrendSchema = z.object({
  recipe: z.object({ id: z.number().int(), code: z.string(), name: z.string() }),
  spec: z.object({ id: z.string(), name: z.string(), unit: z.string(), target: z.number().nullable(), lowerLimit: z.number().nullable(), upperLimit: z.number().nullable() }),
  points: z.array(TrendPointSchema),
  /** From the process library's individualsChart over the included points (or the frozen baseline). */
  chart: z.object({
    mean: z.number(),
    movingRangeMean: z.number(),
    ucl: z.number(),
    lcl: z.number(),
    movingRangeUcl: z.number(),
    signals: z.array(z.object({ index: z.number().int(), rule: z.string() })),
  }).nullable(),
  capability: z.object({ n: z.number().int(), mean: z.number(), sigmaWithin: z.number(), sigmaOverall: z.number(), cp: z.number().nullable(), cpk: z.number().nullable(), pp: z.number().nullable(), ppk: z.number().nullable() }).nullable(),
  frozen: z.object({ baselineRunIds: z.array(z.number().int()), mean: z.number(), sigma: z.number(), frozenAt: z.string(), reason: z.string() }).nullable(),
  /** Below 20 points the figures are provisional (common practice, no source). */
  isProvisional: z.boolean(),
  note: z.string().nullable(),
});
export type Trend = z.infer<typeof TrendSchema>;

export const TrendSpecListSchema = z.object({
  specs: z.array(z.object({ recipeId: z.number().int(), recipeCode: z.string(), specId: z.string(), name: z.string(), unit: z.string(), points: z.number().int() })),
});

export const QualityDashboardSchema = z.object({
  openBySeverity: z.record(z.string(), z.number().int()),
  openByAge: z.object({ underDay: z.number().int(), underWeek: z.number().int(), older: z.number().int() }),
  runsAwaitingSignOff: z.array(z.object({ id: z.number().int(), code: z.string(), recipeCode: z.string(), completedAt: z.string().nullable(), openDeviations: z.number().int() })),
  versionsAwaitingReview: z.array(z.object({ id: z.number().int(), recipeId: z.number().int(), recipeCode: z.string(), number: z.number().int(), submittedAt: z.string().nullable() })),
  lowCapability: z.array(z.object({ recipeId: z.number().int(), recipeCode: z.string(), specId: z.string(), specName: z.string(), cpk: z.number(), n: z.number().int() })),
});
export type QualityDashboard = z.infer<typeof QualityDashboardSchema>;

/** What waits for a quality decision, counted whole (the home page's figures; the overview lists them). */
export const QualityWaitingSchema = z.object({
  deviationsNotClosed: z.number().int(),
  runsAwaitingSignOff: z.number().int(),
  versionsAwaitingReview: z.number().int(),
});
export type QualityWaiting = z.infer<typeof QualityWaitingSchema>;
