import { z } from 'zod';

import { optionalText, textField } from './common.schema';
import { SolventSchema } from './ghs.schema';
import { optionalIsoDate, optionalQuantity, quantity, IsoDateSchema, VersionSchema } from './number-fields.schema';

export const INK_FUNCTIONS = ['conductor', 'dielectric', 'graphic'] as const;
export const InkFunctionSchema = z.enum(INK_FUNCTIONS, { error: 'Ink function is conductor, dielectric or graphic.' });

const inkFields = z.object({
  name: textField('Name', 120),
  manufacturer: optionalText('Manufacturer', 120).default(''),
  function: InkFunctionSchema,
  viscosityMilliPaS: quantity('Viscosity', 'mPa·s', 0, 10_000, { exclusiveMin: true }),
  surfaceTensionMilliNPerM: quantity('Surface tension', 'mN/m', 0, 100, { exclusiveMin: true }),
  surfaceTensionDispersiveMilliNPerM: optionalQuantity('Dispersive part', 'mN/m', 0, 100),
  surfaceTensionPolarMilliNPerM: optionalQuantity('Polar part', 'mN/m', 0, 100),
  densityKgPerM3: quantity('Density', 'kg/m³', 100, 25_000),
  solidsWtPercent: quantity('Solids', 'wt%', 0, 100),
  solidsDensityKgPerM3: optionalQuantity('Solids density', 'kg/m³', 100, 25_000),
  sheetResistanceOhmPerSq: optionalQuantity('Sheet resistance per pass', 'Ω/sq', 0, 1e12, { exclusiveMin: true }),
  tcrPerK: optionalQuantity('Temperature coefficient of resistance', '1/K', -0.1, 0.1),
  cureReferenceTempC: optionalQuantity('Reference cure temperature', '°C', 0, 600),
  cureReferenceMinutes: optionalQuantity('Reference cure time', 'min', 0, 10_000, { exclusiveMin: true }),
  activationEnergyKJPerMol: optionalQuantity('Activation energy', 'kJ/mol', 0, 500, { exclusiveMin: true }),
  minEffectiveCureTempC: optionalQuantity('Minimum effective cure temperature', '°C', 0, 600),
  potLifeHours: optionalQuantity('Pot life after opening', 'h', 0, 100_000, { exclusiveMin: true }),
  storageNotes: optionalText('Storage notes', 1000).default(''),
  solvents: z.array(SolventSchema).max(10, 'At most 10 solvents.').default([]),
  notes: optionalText('Notes', 4000).default(''),
});

/** Cross-field rules an engineer would catch by eye; each names the field to fix. */
const inkRules = <T extends z.infer<typeof inkFields>>(ink: T, ctx: z.RefinementCtx) => {
  const d = ink.surfaceTensionDispersiveMilliNPerM;
  const p = ink.surfaceTensionPolarMilliNPerM;
  if ((d === null) !== (p === null)) {
    ctx.addIssue({ code: 'custom', path: [d === null ? 'surfaceTensionDispersiveMilliNPerM' : 'surfaceTensionPolarMilliNPerM'], message: 'Give both the dispersive and the polar part, or neither.' });
  } else if (d !== null && p !== null && Math.abs(d + p - ink.surfaceTensionMilliNPerM) > 0.5) {
    ctx.addIssue({ code: 'custom', path: ['surfaceTensionPolarMilliNPerM'], message: `Dispersive + polar (${(d + p).toFixed(1)}) must equal the surface tension (${ink.surfaceTensionMilliNPerM}) within 0.5 mN/m.` });
  }
  if (ink.function === 'conductor' && ink.sheetResistanceOhmPerSq === null) {
    ctx.addIssue({ code: 'custom', path: ['sheetResistanceOhmPerSq'], message: 'A conductor needs its sheet resistance per pass.' });
  }
  if ((ink.cureReferenceTempC === null) !== (ink.cureReferenceMinutes === null)) {
    ctx.addIssue({ code: 'custom', path: ['cureReferenceMinutes'], message: 'Give the reference cure as both a temperature and a time.' });
  }
  if (ink.solidsWtPercent > 0 && ink.solidsDensityKgPerM3 !== null && ink.solidsDensityKgPerM3 < ink.densityKgPerM3) {
    ctx.addIssue({ code: 'custom', path: ['solidsDensityKgPerM3'], message: 'Solids are denser than the ink that carries them; check the solids density.' });
  }
};

export const InkInputSchema = inkFields.superRefine(inkRules);
export type InkInput = z.infer<typeof InkInputSchema>;
export const InkUpdateSchema = inkFields.extend({ version: VersionSchema }).superRefine(inkRules);
export type InkUpdate = z.infer<typeof InkUpdateSchema>;
export const InkSchema = inkFields.extend({ id: z.number().int(), version: z.number().int(), archived: z.boolean(), updatedAt: z.string() });
export type Ink = z.infer<typeof InkSchema>;

export const SUBSTRATE_CLASSES = [
  'tpu-film',
  'pet-film',
  'pen-film',
  'polyimide-film',
  'transfer-paper',
  'tattoo-paper',
  'textile-transfer-sheet',
  'thermoplastic-sheet',
  'textile',
  'coated-paper',
  'other',
] as const;
export const SubstrateClassSchema = z.enum(SUBSTRATE_CLASSES, { error: 'Pick a substrate class from the list.' });
export type SubstrateClass = z.infer<typeof SubstrateClassSchema>;

const substrateFields = z.object({
  name: textField('Name', 120),
  manufacturer: optionalText('Manufacturer', 120).default(''),
  substrateClass: SubstrateClassSchema,
  thicknessUm: quantity('Thickness', 'µm', 0, 10_000, { exclusiveMin: true }),
  surfaceEnergyDispersiveMilliNPerM: optionalQuantity('Surface energy, dispersive', 'mN/m', 0, 100),
  surfaceEnergyPolarMilliNPerM: optionalQuantity('Surface energy, polar', 'mN/m', 0, 100),
  waterContactAngleDeg: optionalQuantity('Water contact angle', '°', 0, 180),
  diiodomethaneContactAngleDeg: optionalQuantity('Diiodomethane contact angle', '°', 0, 180),
  maxContinuousTempC: quantity('Continuous maximum temperature', '°C', -50, 600),
  maxShortExposureTempC: quantity('Short-exposure maximum temperature', '°C', -50, 700),
  maxShortExposureSeconds: quantity('Short-exposure time', 's', 0, 3_600, { exclusiveMin: true }),
  maxStrainPercent: optionalQuantity('Maximum strain', '%', 0, 2_000),
  isTransferCarrier: z.boolean({ error: 'Say whether this is a transfer carrier.' }).default(false),
  notes: optionalText('Notes', 4000).default(''),
});

const substrateRules = <T extends z.infer<typeof substrateFields>>(s: T, ctx: z.RefinementCtx) => {
  if (s.maxShortExposureTempC < s.maxContinuousTempC) {
    ctx.addIssue({ code: 'custom', path: ['maxShortExposureTempC'], message: 'The short-exposure maximum cannot be below the continuous maximum.' });
  }
  if ((s.surfaceEnergyDispersiveMilliNPerM === null) !== (s.surfaceEnergyPolarMilliNPerM === null)) {
    ctx.addIssue({ code: 'custom', path: ['surfaceEnergyPolarMilliNPerM'], message: 'Give both surface-energy parts, or neither (or enter contact angles instead).' });
  }
  if ((s.waterContactAngleDeg === null) !== (s.diiodomethaneContactAngleDeg === null)) {
    ctx.addIssue({ code: 'custom', path: ['diiodomethaneContactAngleDeg'], message: 'The surface-energy method needs both contact angles: water and diiodomethane.' });
  }
};

export const SubstrateInputSchema = substrateFields.superRefine(substrateRules);
export type SubstrateInput = z.infer<typeof SubstrateInputSchema>;
export const SubstrateUpdateSchema = substrateFields.extend({ version: VersionSchema }).superRefine(substrateRules);
export type SubstrateUpdate = z.infer<typeof SubstrateUpdateSchema>;
export const SubstrateSchema = substrateFields.extend({ id: z.number().int(), version: z.number().int(), archived: z.boolean(), updatedAt: z.string() });
export type Substrate = z.infer<typeof SubstrateSchema>;

export const LOT_MATERIAL_TYPES = ['ink', 'substrate'] as const;

const lotFields = z.object({
  materialType: z.enum(LOT_MATERIAL_TYPES, { error: 'A lot belongs to an ink or a substrate.' }),
  materialId: z.number({ error: 'Pick the material of this lot.' }).int().positive(),
  lotNumber: textField('Lot number', 60),
  receivedOn: IsoDateSchema,
  openedOn: optionalIsoDate,
  expiresOn: optionalIsoDate,
  notes: optionalText('Notes', 1000).default(''),
});

const lotRules = <T extends z.infer<typeof lotFields>>(lot: T, ctx: z.RefinementCtx) => {
  if (lot.openedOn && lot.openedOn < lot.receivedOn) {
    ctx.addIssue({ code: 'custom', path: ['openedOn'], message: 'A lot cannot be opened before it was received.' });
  }
  if (lot.expiresOn && lot.expiresOn < lot.receivedOn) {
    ctx.addIssue({ code: 'custom', path: ['expiresOn'], message: 'The expiry date is before the date received; check it.' });
  }
};

export const LotInputSchema = lotFields.superRefine(lotRules);
export type LotInput = z.infer<typeof LotInputSchema>;
export const LotUpdateSchema = lotFields.extend({ version: VersionSchema }).superRefine(lotRules);
export type LotUpdate = z.infer<typeof LotUpdateSchema>;
export const LotSchema = lotFields.extend({
  id: z.number().int(),
  version: z.number().int(),
  archived: z.boolean(),
  updatedAt: z.string(),
  materialName: z.string(),
});
export type Lot = z.infer<typeof LotSchema>;
