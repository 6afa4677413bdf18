import { z } from 'zod';

/** The output of `jettability` (process/jettability.ts). */
export const JettabilityResultSchema = z.object({
  ohnesorge: z.number(),
  z: z.number(),
  reynolds: z.number().nullable(),
  weber: z.number().nullable(),
  splashParameter: z.number().nullable(),
  verdict: z.enum(['too-viscous', 'satellites', 'no-ejection', 'splashing', 'jettable']),
  reasons: z.array(z.string()),
});

/** One printable window judged for one ink through one printer. */
export const WindowFitSchema = z.object({
  windowId: z.enum(['reis-derby', 'jang-kim-moon']),
  /** e.g. "1 < Z < 10" */
  label: z.string(),
  source: z.string(),
  isDefault: z.boolean(),
  result: JettabilityResultSchema,
});

export const PrinterFitSchema = z.object({
  printerId: z.number().int(),
  printerName: z.string(),
  nozzleDiameterUm: z.number(),
  jettingSpeedMetresPerSecond: z.number(),
  /** The default window first, then the alternative. Z, Re and We are the same in both. */
  windows: z.array(WindowFitSchema),
  /** Why this pair could not be judged (a stored value is not physical); `windows` is then empty. */
  problem: z.string().nullable(),
});

/** `GET /api/inks/:id/printability` */
export const InkPrintabilitySchema = z.object({
  inkId: z.number().int(),
  inkName: z.string(),
  /** φv, a fraction 0–1; null when the solids density is not recorded. */
  solidsVolumeFraction: z.number().nullable(),
  solidsVolumeFractionNote: z.string(),
  printers: z.array(PrinterFitSchema),
});
export type InkPrintability = z.infer<typeof InkPrintabilitySchema>;

export const SurfaceEnergySourceSchema = z.enum(['recorded-parts', 'owrk-contact-angles']);

export const SubstrateSurfaceEnergySchema = z.object({
  source: SurfaceEnergySourceSchema,
  dispersiveMilliNPerM: z.number(),
  polarMilliNPerM: z.number(),
  totalMilliNPerM: z.number(),
});
export type SubstrateSurfaceEnergy = z.infer<typeof SubstrateSurfaceEnergySchema>;

export const InkWettingSchema = z.object({
  inkId: z.number().int(),
  inkName: z.string(),
  inkSurfaceTensionMilliNPerM: z.number(),
  /** Substrate surface energy minus ink surface tension; null when the substrate's is unknown. */
  margin: z.object({ marginMilliNPerM: z.number(), ok: z.boolean() }).nullable(),
  /** OWRK prediction; null unless both the ink's parts and the substrate's energy are known. */
  predictedContactAngleDeg: z.number().nullable(),
  reasons: z.array(z.string()),
});
export type InkWetting = z.infer<typeof InkWettingSchema>;

/** `GET /api/substrates/:id/wetting` */
export const SubstrateWettingSchema = z.object({
  substrateId: z.number().int(),
  substrateName: z.string(),
  surfaceEnergy: SubstrateSurfaceEnergySchema.nullable(),
  /** How the surface energy was found, or why it could not be. */
  surfaceEnergyNote: z.string(),
  requiredMarginMilliNPerM: z.number(),
  inks: z.array(InkWettingSchema),
});
export type SubstrateWetting = z.infer<typeof SubstrateWettingSchema>;
