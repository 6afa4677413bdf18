import { z } from 'zod';

import { optionalText, textField } from './common.schema';
import { TreatmentMethodSchema } from './equipment.schema';
import { SolventSchema } from './ghs.schema';
import { optionalQuantity, quantity } from './number-fields.schema';

export const STEP_KINDS = ['surface-treatment', 'print-pass', 'dry', 'cure', 'transfer', 'attach-parts', 'inspect'] as const;
export const StepKindSchema = z.enum(STEP_KINDS, { error: 'Unknown step kind.' });
export type StepKind = z.infer<typeof StepKindSchema>;

/** Words people use for each kind (labels, palette, run view). */
export const STEP_KIND_LABELS: Record<StepKind, string> = {
  'surface-treatment': 'Surface treatment',
  'print-pass': 'Print pass',
  dry: 'Dry',
  cure: 'Cure',
  transfer: 'Transfer',
  'attach-parts': 'Attach parts',
  inspect: 'Inspect',
};

const ref = (label: string) => z.number({ error: `Pick the ${label}.` }).int().positive();
const optionalRef = (label: string) => ref(label).nullable().default(null);

/** Stable id of a step or spec across edits and versions (lets the diff see moves). */
export const StepIdSchema = z.string().regex(/^[A-Za-z0-9_-]{6,40}$/, 'Step ids are 6–40 letters, digits, - or _.');

export const ReadingSpecSchema = z
  .object({
    id: StepIdSchema,
    name: textField('Reading name', 80),
    unit: textField('Unit', 20),
    target: optionalQuantity('Target', 'the unit', -1e12, 1e12),
    lowerLimit: optionalQuantity('Lower limit', 'the unit', -1e12, 1e12),
    upperLimit: optionalQuantity('Upper limit', 'the unit', -1e12, 1e12),
    required: z.boolean().default(true),
    perPiece: z.boolean().default(false),
    /** For a trace-resistance reading: the trace it measures, so the expected value can be computed. */
    traceLengthMm: optionalQuantity('Trace length', 'mm', 0, 10_000, { exclusiveMin: true }),
    traceWidthMm: optionalQuantity('Trace width', 'mm', 0, 1_000, { exclusiveMin: true }),
  })
  .superRefine((spec, ctx) => {
    if (spec.lowerLimit !== null && spec.upperLimit !== null && spec.lowerLimit > spec.upperLimit) {
      ctx.addIssue({ code: 'custom', path: ['upperLimit'], message: 'The upper limit must not be below the lower limit.' });
    }
    const inside = (v: number) => (spec.lowerLimit === null || v >= spec.lowerLimit) && (spec.upperLimit === null || v <= spec.upperLimit);
    if (spec.target !== null && !inside(spec.target)) {
      ctx.addIssue({ code: 'custom', path: ['target'], message: 'The target must lie between the limits.' });
    }
    if ((spec.traceLengthMm === null) !== (spec.traceWidthMm === null)) {
      ctx.addIssue({ code: 'custom', path: ['traceWidthMm'], message: 'Give both the trace length and width, or neither.' });
    }
  });
export type ReadingSpec = z.infer<typeof ReadingSpecSchema>;

export const SurfaceTreatmentParamsSchema = z.object({
  method: TreatmentMethodSchema,
  treaterId: optionalRef('surface treater'),
  settings: optionalText('Settings', 500).default(''),
  targetSurfaceEnergyMilliNPerM: optionalQuantity('Target surface energy', 'mN/m', 0, 100, { exclusiveMin: true }),
  targetWaterContactAngleDeg: optionalQuantity('Target water contact angle', '°', 0, 180),
  maxWaitBeforePrintMinutes: optionalQuantity('Longest wait before printing', 'min', 0, 100_000, { exclusiveMin: true }),
  solvent: SolventSchema.nullable().default(null),
});

export const PrintPassParamsSchema = z.object({
  inkId: ref('ink'),
  channel: textField('Channel', 30),
  artworkFileId: optionalRef('artwork'),
  dpi: quantity('Resolution', 'dpi', 1, 10_000),
  passes: z.number({ error: 'Passes must be a whole number.' }).int('Passes must be a whole number.').min(1, 'At least one pass.').max(50, 'At most 50 passes.'),
  platenTempC: optionalQuantity('Platen temperature', '°C', 0, 200),
  nozzleCheckRequired: z.boolean().default(true),
  /** Printed fraction of the artwork (0–1), from the uploaded layer; drives the ink-use estimate. */
  printedAreaFraction: optionalQuantity('Printed area fraction', '', 0, 1),
  /** Printed area of one piece in mm² (the artwork's extent), for the ink-use estimate. */
  pieceAreaMm2: optionalQuantity('Piece area', 'mm²', 0, 1e7, { exclusiveMin: true }),
});

export const DRY_METHODS = ['air', 'oven', 'hot-plate', 'heat-gun'] as const;
export const DryParamsSchema = z.object({
  method: z.enum(DRY_METHODS, { error: 'Dry in air, in an oven, on a hot plate or with a heat gun.' }),
  heatSourceId: optionalRef('heat source'),
  temperatureC: quantity('Temperature', '°C', -20, 400),
});

export const CureParamsSchema = z.object({
  heatSourceId: optionalRef('heat source'),
  temperatureC: quantity('Temperature', '°C', 0, 600),
  minutes: quantity('Time at temperature', 'min', 0, 10_000, { exclusiveMin: true }),
  rampCPerMinute: optionalQuantity('Ramp', '°C/min', 0, 1_000, { exclusiveMin: true }),
});

export const TransferParamsSchema = z.object({
  heatSourceId: optionalRef('heat press'),
  temperatureC: quantity('Press temperature', '°C', 0, 400),
  pressureKPa: quantity('Pressure', 'kPa', 0, 10_000, { exclusiveMin: true }),
  seconds: quantity('Press time', 's', 0, 3_600, { exclusiveMin: true }),
  peel: z.enum(['hot', 'cold'], { error: 'Peel hot or cold.' }),
});

export const ATTACH_METHODS = ['z-axis-tape', 'conductive-thread', 'low-temp-solder', 'conductive-adhesive'] as const;
export const AttachMethodSchema = z.enum(ATTACH_METHODS, { error: 'Pick how parts are attached.' });
export const PartSchema = z.object({
  name: textField('Part', 120),
  quantity: z.number({ error: 'Quantity must be a whole number.' }).int().min(1).max(10_000),
  placement: optionalText('Placement', 300).default(''),
});
export const AttachPartsParamsSchema = z.object({
  method: AttachMethodSchema,
  parts: z.array(PartSchema).max(100).default([]),
  /** Solder or adhesive at a temperature: drives the hot-iron caution and the heat checks. */
  temperatureC: optionalQuantity('Working temperature', '°C', 0, 450),
});

export const InspectParamsSchema = z.object({
  lookFor: optionalText('What to look at', 2000).default(''),
  measure: optionalText('What to measure', 2000).default(''),
});

const common = {
  id: StepIdSchema,
  title: textField('Step title', 120),
  instructions: optionalText('Instructions', 20_000).default(''),
  minMinutes: optionalQuantity('Shortest time', 'min', 0, 100_000),
  maxMinutes: optionalQuantity('Longest time', 'min', 0, 100_000),
  handsOnMinutes: optionalQuantity('Hands-on time', 'min', 0, 100_000),
  readingSpecs: z.array(ReadingSpecSchema).max(30, 'At most 30 readings per step.').default([]),
  safetyNotes: z.array(textField('Safety note', 500)).max(20).default([]),
};

/** One step of a recipe version; `params` is typed by `kind` (one zod schema per kind). */
export const RecipeStepSchema = z
  .discriminatedUnion('kind', [
    z.object({ ...common, kind: z.literal('surface-treatment'), params: SurfaceTreatmentParamsSchema }),
    z.object({ ...common, kind: z.literal('print-pass'), params: PrintPassParamsSchema }),
    z.object({ ...common, kind: z.literal('dry'), params: DryParamsSchema }),
    z.object({ ...common, kind: z.literal('cure'), params: CureParamsSchema }),
    z.object({ ...common, kind: z.literal('transfer'), params: TransferParamsSchema }),
    z.object({ ...common, kind: z.literal('attach-parts'), params: AttachPartsParamsSchema }),
    z.object({ ...common, kind: z.literal('inspect'), params: InspectParamsSchema }),
  ])
  .superRefine((step, ctx) => {
    if (step.minMinutes !== null && step.maxMinutes !== null && step.minMinutes > step.maxMinutes) {
      ctx.addIssue({ code: 'custom', path: ['maxMinutes'], message: 'The longest time must not be below the shortest.' });
    }
    if (new Set(step.readingSpecs.map((r) => r.id)).size !== step.readingSpecs.length) {
      ctx.addIssue({ code: 'custom', path: ['readingSpecs'], message: 'Reading ids must differ.' });
    }
  });
export type RecipeStep = z.infer<typeof RecipeStepSchema>;
export type RecipeStepOf<K extends StepKind> = Extract<RecipeStep, { kind: K }>;
