import { z } from 'zod';

import { IdSchema, optionalText, textField } from './common.schema';
import { optionalIsoDate, quantity } from './number-fields.schema';
import { StepIdSchema } from './recipe-step.schema';

export const RUN_STATES = ['planned', 'in-progress', 'on-hold', 'completed', 'closed', 'cancelled'] as const;
export const RunStateSchema = z.enum(RUN_STATES);
export type RunState = z.infer<typeof RunStateSchema>;

/** A reason typed by a person: required when choosing a flagged lot or machine, holding or cancelling. */
export const ReasonSchema = textField('Reason', 1000, 3);

export const EQUIPMENT_KINDS = ['printer', 'heat-source', 'surface-treater', 'instrument'] as const;
export const EquipmentKindSchema = z.enum(EQUIPMENT_KINDS);

export const RunLotChoiceSchema = z.object({
  lotId: IdSchema,
  /** Needed when the lot is expired or past its pot life; the choice then raises a deviation. */
  reason: ReasonSchema.nullable().default(null),
});

export const RunEquipmentChoiceSchema = z.object({
  kind: EquipmentKindSchema,
  id: IdSchema,
  /** Needed when the machine is past its calibration date; the choice then raises a deviation. */
  reason: ReasonSchema.nullable().default(null),
});

export const PlanRunInputSchema = z.object({
  versionId: IdSchema,
  quantity: z.number({ error: 'Quantity must be a whole number.' }).int('Quantity must be a whole number.').min(1, 'Make at least one piece.').max(500, 'At most 500 pieces per run.'),
  dueOn: optionalIsoDate,
  lots: z.array(RunLotChoiceSchema).max(50).default([]),
  /** Leave empty to use the machines the version names; another machine re-runs the version's checks. */
  equipment: z.array(RunEquipmentChoiceSchema).max(50).default([]),
  notes: optionalText('Notes', 2000).default(''),
});
export type PlanRunInput = z.infer<typeof PlanRunInputSchema>;

export const RunStateChangeSchema = z.object({ reason: ReasonSchema });

/** Every tablet write carries the device's clock too, flagged when it was made offline. */
export const DeviceStampSchema = z.object({
  deviceTime: z.iso.datetime({ offset: true }).nullable().default(null),
  madeOffline: z.boolean().default(false),
});

export const StartTimerInputSchema = DeviceStampSchema.extend({
  stepId: StepIdSchema,
  label: textField('Timer label', 80),
  plannedSeconds: quantity('Timer length', 's', 1, 7 * 24 * 3600),
});

export const StopTimerInputSchema = DeviceStampSchema.extend({
  /** Asked for when stopping past the step's longest time (raises a deviation). */
  reason: ReasonSchema.nullable().default(null),
});

export const CompleteStepInputSchema = DeviceStampSchema.extend({
  note: optionalText('Note', 2000).default(''),
});

export const StepNotDoneInputSchema = DeviceStampSchema.extend({ reason: ReasonSchema });

export const RecordReadingInputSchema = DeviceStampSchema.extend({
  stepId: StepIdSchema,
  specId: StepIdSchema,
  pieceId: IdSchema.nullable().default(null),
  value: quantity('Reading', 'its unit', -1e12, 1e12),
  instrumentId: IdSchema.nullable().default(null),
  /** For resistance readings: the room temperature, so the value can be corrected to 20 °C. */
  ambientTempC: quantity('Ambient temperature', '°C', -40, 80).nullable().default(null),
  /** An out-of-limit value must be confirmed; it then raises a deviation. */
  confirmOutOfLimits: z.boolean().default(false),
});
export type RecordReadingInput = z.infer<typeof RecordReadingInputSchema>;

export const CorrectReadingInputSchema = DeviceStampSchema.extend({
  value: quantity('Reading', 'its unit', -1e12, 1e12),
  reason: ReasonSchema,
  confirmOutOfLimits: z.boolean().default(false),
});

export const CureLogInputSchema = DeviceStampSchema.extend({
  stepId: StepIdSchema,
  samples: z
    .array(z.object({ minute: quantity('Minute', 'min', 0, 100_000), tempC: quantity('Temperature', '°C', -50, 700) }))
    .min(2, 'Enter at least two log points (minute, °C).')
    .max(2_000, 'At most 2000 log points.'),
});

export const ConfirmLotInputSchema = DeviceStampSchema.extend({
  stepId: StepIdSchema,
  lotId: IdSchema,
});

export const NozzleCheckInputSchema = DeviceStampSchema.extend({
  stepId: StepIdSchema,
  passed: z.boolean(),
  photoFileId: IdSchema.nullable().default(null),
});

export const DEVIATION_SEVERITIES = ['minor', 'major', 'critical'] as const;
export const DeviationSeveritySchema = z.enum(DEVIATION_SEVERITIES, { error: 'Severity is minor, major or critical.' });

export const ReportProblemInputSchema = DeviceStampSchema.extend({
  stepId: StepIdSchema.nullable().default(null),
  pieceIds: z.array(IdSchema).max(500).default([]),
  description: textField('Description', 4000, 3),
  severity: DeviationSeveritySchema,
  photoFileIds: z.array(IdSchema).max(10, 'At most 10 photos.').default([]),
});
export type ReportProblemInput = z.infer<typeof ReportProblemInputSchema>;

export const DEVIATION_RULES = [
  'reading-out-of-limits',
  'timer-ended-early',
  'timer-over-maximum',
  'cure-dose-short',
  'expired-lot',
  'lot-past-pot-life',
  'calibration-overdue',
  'treatment-wait-exceeded',
  'step-not-done',
  'reported',
] as const;
export const DeviationRuleSchema = z.enum(DEVIATION_RULES);
export type DeviationRule = z.infer<typeof DeviationRuleSchema>;

export const DEVIATION_STATES = ['open', 'in-review', 'dispositioned', 'closed'] as const;
export const DeviationStateSchema = z.enum(DEVIATION_STATES);
