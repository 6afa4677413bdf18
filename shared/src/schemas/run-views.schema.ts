import { z } from 'zod';

import { SafetyNoteSchema } from '../rules/recipe/safety-notes';
import { InkSchema } from './material.schema';
import { DraftContentSchema } from './recipe.schema';
import { StepIdSchema } from './recipe-step.schema';
import {
  DeviationRuleSchema,
  DeviationSeveritySchema,
  DeviationStateSchema,
  EquipmentKindSchema,
  RunStateSchema,
} from './run.schema';

const Iso = z.string();
const PersonRef = z.object({ id: z.number().int(), name: z.string() }).nullable();

export const RunSummarySchema = z.object({
  id: z.number().int(),
  code: z.string(),
  state: RunStateSchema,
  recipeId: z.number().int(),
  recipeCode: z.string(),
  recipeName: z.string(),
  versionId: z.number().int(),
  versionNumber: z.number().int(),
  quantity: z.number().int(),
  dueOn: z.string().nullable(),
  doneSteps: z.number().int(),
  totalSteps: z.number().int(),
  openDeviations: z.number().int(),
  createdAt: Iso,
  createdBy: PersonRef,
});
export type RunSummary = z.infer<typeof RunSummarySchema>;
export const RunListSchema = z.object({ runs: z.array(RunSummarySchema), total: z.number().int() });

export const RunPieceSchema = z.object({ id: z.number().int(), code: z.string(), number: z.number().int() });

export const RunLotViewSchema = z.object({
  lotId: z.number().int(),
  lotNumber: z.string(),
  materialType: z.enum(['ink', 'substrate']),
  materialId: z.number().int(),
  materialName: z.string(),
  flags: z.array(z.string()),
  reason: z.string().nullable(),
});

export const RunEquipmentViewSchema = z.object({
  kind: EquipmentKindSchema,
  id: z.number().int(),
  name: z.string(),
  calibrationDueOn: z.string().nullable(),
  reason: z.string().nullable(),
});

export const STEP_RECORD_STATES = ['pending', 'in-progress', 'done', 'not-done'] as const;
export const StepRecordViewSchema = z.object({
  stepId: StepIdSchema,
  state: z.enum(STEP_RECORD_STATES),
  safetyAcknowledgedAt: Iso.nullable(),
  safetyAcknowledgedBy: PersonRef,
  startedAt: Iso.nullable(),
  startedBy: PersonRef,
  completedAt: Iso.nullable(),
  completedBy: PersonRef,
  notDoneReason: z.string().nullable(),
  note: z.string(),
  confirmedLotIds: z.array(z.number().int()),
  nozzleCheck: z.object({ passed: z.boolean(), photoFileId: z.number().int().nullable(), at: Iso }).nullable(),
  /** True when a write for this step carried only the tablet's clock (made offline). */
  hasDeviceTime: z.boolean(),
});
export type StepRecordView = z.infer<typeof StepRecordViewSchema>;

export const TimerViewSchema = z.object({
  id: z.number().int(),
  stepId: StepIdSchema,
  label: z.string(),
  plannedSeconds: z.number(),
  startedAt: Iso,
  stoppedAt: Iso.nullable(),
  /** The start came from a tablet's clock while offline, not the server's. */
  startedOnDeviceClock: z.boolean(),
  startedBy: PersonRef,
});
export type TimerView = z.infer<typeof TimerViewSchema>;

export const ReadingViewSchema = z.object({
  id: z.number().int(),
  stepId: StepIdSchema,
  specId: StepIdSchema,
  pieceId: z.number().int().nullable(),
  value: z.number(),
  unit: z.string(),
  correctedValue: z.number().nullable(),
  ambientTempC: z.number().nullable(),
  instrumentId: z.number().int().nullable(),
  outOfLimits: z.boolean(),
  recordedAt: Iso,
  recordedBy: PersonRef,
  /** A corrected reading points at the one that replaced it; the original stays in the record. */
  supersededById: z.number().int().nullable(),
  correctionReason: z.string().nullable(),
});
export type ReadingView = z.infer<typeof ReadingViewSchema>;

export const DeviationSummarySchema = z.object({
  id: z.number().int(),
  runId: z.number().int(),
  stepId: StepIdSchema.nullable(),
  rule: DeviationRuleSchema,
  severity: DeviationSeveritySchema,
  state: DeviationStateSchema,
  title: z.string(),
  expected: z.string(),
  actual: z.string(),
  pieceIds: z.array(z.number().int()),
  photoFileIds: z.array(z.number().int()),
  createdAt: Iso,
  createdBy: PersonRef,
});
export type DeviationSummary = z.infer<typeof DeviationSummarySchema>;

/** Everything the tablet needs to run (and cache for offline use) in one answer. */
export const RunDetailSchema = RunSummarySchema.extend({
  notes: z.string(),
  holdReason: z.string().nullable(),
  content: DraftContentSchema,
  pieces: z.array(RunPieceSchema),
  lots: z.array(RunLotViewSchema),
  equipment: z.array(RunEquipmentViewSchema),
  steps: z.array(StepRecordViewSchema),
  timers: z.array(TimerViewSchema),
  readings: z.array(ReadingViewSchema),
  deviations: z.array(DeviationSummarySchema),
  /** Cautions per step (derived + the recipe's own), shown on the safety card before heat or solvent steps. */
  safetyNotes: z.record(z.string(), z.array(SafetyNoteSchema)),
  /** The inks the recipe uses (names, TCR for the 20 °C correction, solvents for cautions). */
  inks: z.array(InkSchema),
  /** Instruments an operator may pick when recording a reading, with calibration dates. */
  instruments: z.array(z.object({ id: z.number().int(), name: z.string(), kind: z.string(), calibrationDueOn: z.string().nullable() })),
  /** The server's clock when this was read, so a tablet can measure its own clock's offset. */
  serverTime: Iso,
  travellerUrl: z.string(),
});
export type RunDetail = z.infer<typeof RunDetailSchema>;
