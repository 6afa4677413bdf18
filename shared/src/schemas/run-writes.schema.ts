import { z } from 'zod';

import { DeviationSummarySchema, ReadingViewSchema, StepRecordViewSchema, TimerViewSchema } from './run-views.schema';
import { RunStateSchema } from './run.schema';

/** GET /api/runs: filters and paging. `state` '' (or absent) means every state. */
export const RunListQuerySchema = z.object({
  state: z
    .union([RunStateSchema, z.literal('')], { error: 'Pick a run state from the list.' })
    .optional()
    .transform((state) => state || undefined),
  q: z.string({ error: 'Search must be text.' }).trim().max(100, 'Search can be at most 100 characters.').default(''),
  page: z.coerce.number({ error: 'Page must be a number.' }).int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number({ error: 'Page size must be a number.' }).int().min(1).max(100).default(25),
});
export type RunListQuery = z.infer<typeof RunListQuerySchema>;

/** How a reading was judged (evaluateReading); also the `details.evaluation` of an unconfirmed out-of-limit 422. */
export const ReadingEvaluationSchema = z.object({
  outOfLimits: z.boolean(),
  side: z.enum(['low', 'high']).nullable(),
  correctedValue: z.number().nullable(),
  correctedTo: z.number().nullable(),
  limitsText: z.string(),
  message: z.string(),
});

const PersonRef = z.object({ id: z.number().int(), name: z.string() }).nullable();

/** What every tablet write answers with: where the run stands now and the deviations this write raised. */
const written = {
  runId: z.number().int(),
  runState: RunStateSchema,
  deviations: z.array(DeviationSummarySchema),
};

/** Safety acknowledgement, start, complete, not done, lot confirmation, nozzle check. */
export const StepWriteResultSchema = z.object({ ...written, step: StepRecordViewSchema });
export type StepWriteResult = z.infer<typeof StepWriteResultSchema>;

/** Timer start and stop. */
export const TimerWriteResultSchema = z.object({ ...written, timer: TimerViewSchema });
export type TimerWriteResult = z.infer<typeof TimerWriteResultSchema>;

/** A reading, or a correction: then `superseded` is the original, now pointing at the new one. */
export const ReadingWriteResultSchema = z.object({
  ...written,
  reading: ReadingViewSchema,
  superseded: ReadingViewSchema.nullable(),
  evaluation: ReadingEvaluationSchema,
});
export type ReadingWriteResult = z.infer<typeof ReadingWriteResultSchema>;

/** The dose a cure log gave one ink (cureLogDose); `canJudge` false when the ink lacks its cure data. */
export const CureDoseViewSchema = z.object({
  inkId: z.number().int(),
  inkName: z.string(),
  canJudge: z.boolean(),
  equivalentMinutes: z.number().nullable(),
  referenceMinutes: z.number().nullable(),
  percent: z.number().nullable(),
  isShort: z.boolean(),
  message: z.string(),
});

export const CureLogViewSchema = z.object({
  id: z.number().int(),
  stepId: z.string(),
  samples: z.array(z.object({ minute: z.number(), tempC: z.number() })),
  doses: z.array(CureDoseViewSchema),
  recordedAt: z.string(),
  recordedBy: PersonRef,
});
export type CureLogView = z.infer<typeof CureLogViewSchema>;

export const CureLogWriteResultSchema = z.object({ ...written, cureLog: CureLogViewSchema });
export type CureLogWriteResult = z.infer<typeof CureLogWriteResultSchema>;

/** A reported problem: `deviation` is the one it opened (also the only entry of `deviations`). */
export const ProblemWriteResultSchema = z.object({ ...written, deviation: DeviationSummarySchema });
export type ProblemWriteResult = z.infer<typeof ProblemWriteResultSchema>;

/** Photos from the tablet's camera: checked by content, never by the name or the browser's word. */
export const PHOTO_CONTENT_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoContentType = (typeof PHOTO_CONTENT_TYPES)[number];

/** 15 MiB: a full-resolution phone or tablet photo fits inside it. */
export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;
