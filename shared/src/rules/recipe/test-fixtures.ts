import type { HeatSource, Printer } from '../../schemas/equipment.schema';
import type { Ink, Substrate } from '../../schemas/material.schema';
import type { ReadingSpec, RecipeStep, RecipeStepOf, StepKind } from '../../schemas/recipe-step.schema';
import type { VersionSetup } from '../../schemas/recipe.schema';
import type { ProcessCheck } from './process-check';
import { recipeChecks } from './recipe-checks';
import type { RecipeCheckInput } from './recipe-context';

// FIXTURES ONLY. Every default value below is invented for tests and the bench script: a
// plausible lab, not measured data, and never a check value. Tests that check numbers override
// the fields they judge with published values and name the source beside them.

const RECORD = { version: 1, archived: false, updatedAt: '2026-01-01T00:00:00.000Z' };

/**
 * An invented conductive silver ink; override what a test judges.
 * @example makeInk({ id: 2, function: 'dielectric' }).function // → 'dielectric'
 */
export function makeInk(overrides: Partial<Ink> = {}): Ink {
  return {
    ...RECORD,
    id: 1,
    name: 'Fixture silver ink',
    manufacturer: '',
    function: 'conductor',
    viscosityMilliPaS: 10,
    surfaceTensionMilliNPerM: 30,
    surfaceTensionDispersiveMilliNPerM: 26,
    surfaceTensionPolarMilliNPerM: 4,
    densityKgPerM3: 1500,
    solidsWtPercent: 30,
    solidsDensityKgPerM3: 10_490,
    sheetResistanceOhmPerSq: 0.05,
    tcrPerK: null,
    cureReferenceTempC: 150,
    cureReferenceMinutes: 30,
    activationEnergyKJPerMol: 80,
    minEffectiveCureTempC: 80,
    potLifeHours: null,
    storageNotes: '',
    solvents: [],
    notes: '',
    ...overrides,
  };
}

/**
 * An invented PET-like film; its contact angles are REFERENCES §2.3's illustrative inputs.
 * @example makeSubstrate({ maxContinuousTempC: 120 }).maxShortExposureTempC // → 180
 */
export function makeSubstrate(overrides: Partial<Substrate> = {}): Substrate {
  return {
    ...RECORD,
    id: 1,
    name: 'Fixture PET film',
    manufacturer: '',
    substrateClass: 'pet-film',
    thicknessUm: 125,
    surfaceEnergyDispersiveMilliNPerM: null,
    surfaceEnergyPolarMilliNPerM: null,
    waterContactAngleDeg: 72.5,
    diiodomethaneContactAngleDeg: 27,
    maxContinuousTempC: 150,
    maxShortExposureTempC: 180,
    maxShortExposureSeconds: 60,
    maxStrainPercent: null,
    isTransferCarrier: false,
    notes: '',
    ...overrides,
  };
}

/**
 * An invented desktop printer: 21 µm nozzles, 10 pL drops, 6 m/s, channels C1–C4.
 * @example makePrinter({ dropVolumePl: 14.137 }).nozzleDiameterUm // → 21
 */
export function makePrinter(overrides: Partial<Printer> = {}): Printer {
  return {
    ...RECORD,
    id: 1,
    name: 'Fixture printer',
    model: '',
    nozzleDiameterUm: 21,
    dropVolumePl: 10,
    jettingSpeedMetresPerSecond: 6,
    nativeDpi: 1000,
    channels: ['C1', 'C2', 'C3', 'C4'].map((name) => ({ name, inkId: null })),
    notes: '',
    ...overrides,
  };
}

/**
 * An invented oven reaching 250 °C.
 * @example makeHeatSource({ kind: 'heat-press' }).maxTempC // → 250
 */
export function makeHeatSource(overrides: Partial<HeatSource> = {}): HeatSource {
  return { ...RECORD, id: 1, name: 'Fixture oven', kind: 'oven', maxTempC: 250, calibrationDueOn: null, notes: '', ...overrides };
}

/**
 * Setup on substrate 1 and printer 1 with ink 1 on channel C1.
 * @example makeSetup({ receivingSubstrateId: 2 }).channelPlan // → [{ channel: 'C1', inkId: 1 }]
 */
export function makeSetup(overrides: Partial<VersionSetup> = {}): VersionSetup {
  return { substrateId: 1, receivingSubstrateId: null, printerId: 1, channelPlan: [{ channel: 'C1', inkId: 1 }], heatSourceIds: [], treaterIds: [], changeNote: '', ...overrides };
}

/**
 * A reading spec in Ω (ids, limits and trace size are the test's to choose).
 * @example makeReadingSpec({ traceLengthMm: 100, traceWidthMm: 0.5 }).unit // → 'Ω'
 */
export function makeReadingSpec(overrides: Partial<ReadingSpec> = {}): ReadingSpec {
  return { id: 'r-trace', name: 'Trace resistance', unit: 'Ω', target: null, lowerLimit: null, upperLimit: null, required: true, perPiece: false, traceLengthMm: null, traceWidthMm: null, ...overrides };
}

type Common = Partial<Omit<RecipeStep, 'kind' | 'params' | 'id'>>;

function makeStep<K extends StepKind>(kind: K, id: string, params: RecipeStepOf<K>['params'], common: Common): RecipeStepOf<K> {
  return { id, kind, title: id, instructions: '', minMinutes: null, maxMinutes: null, handsOnMinutes: null, readingSpecs: [], safetyNotes: [], ...common, params } as RecipeStepOf<K>;
}

/**
 * Step builders with invented defaults; pass the params a test cares about.
 * @example steps.cure('cure-1', { temperatureC: 150 }).params.minutes // → 30
 */
export const steps = {
  treatment: (id: string, p: Partial<RecipeStepOf<'surface-treatment'>['params']> = {}, c: Common = {}) =>
    makeStep('surface-treatment', id, { method: 'plasma', treaterId: null, settings: '', targetSurfaceEnergyMilliNPerM: null, targetWaterContactAngleDeg: null, maxWaitBeforePrintMinutes: null, solvent: null, ...p }, c),
  print: (id: string, p: Partial<RecipeStepOf<'print-pass'>['params']> = {}, c: Common = {}) =>
    makeStep('print-pass', id, { inkId: 1, channel: 'C1', artworkFileId: null, dpi: 1000, passes: 1, platenTempC: null, nozzleCheckRequired: true, printedAreaFraction: null, pieceAreaMm2: null, ...p }, c),
  dry: (id: string, p: Partial<RecipeStepOf<'dry'>['params']> = {}, c: Common = {}) =>
    makeStep('dry', id, { method: 'oven', heatSourceId: null, temperatureC: 80, ...p }, { minMinutes: 10, ...c }),
  cure: (id: string, p: Partial<RecipeStepOf<'cure'>['params']> = {}, c: Common = {}) =>
    makeStep('cure', id, { heatSourceId: null, temperatureC: 130, minutes: 30, rampCPerMinute: null, ...p }, c),
  transfer: (id: string, p: Partial<RecipeStepOf<'transfer'>['params']> = {}, c: Common = {}) =>
    makeStep('transfer', id, { heatSourceId: null, temperatureC: 130, pressureKPa: 300, seconds: 15, peel: 'cold', ...p }, c),
  attach: (id: string, p: Partial<RecipeStepOf<'attach-parts'>['params']> = {}, c: Common = {}) =>
    makeStep('attach-parts', id, { method: 'z-axis-tape', parts: [], temperatureC: null, ...p }, c),
  inspect: (id: string, p: Partial<RecipeStepOf<'inspect'>['params']> = {}, c: Common = {}) => makeStep('inspect', id, { lookFor: '', measure: '', ...p }, c),
};

/**
 * One ink, one film, one printer, no heat sources, plus whatever a test overrides.
 * @example makeInput({ steps: [steps.print('print-1')] }).inks.length // → 1
 */
export function makeInput(overrides: Partial<RecipeCheckInput> = {}): RecipeCheckInput {
  return { setup: makeSetup(), steps: [], inks: [makeInk()], substrates: [makeSubstrate()], printers: [makePrinter()], heatSources: [], ...overrides };
}

/**
 * A 40-step recipe that touches every check family (invented data): wipe and plasma, six silver
 * layers with drying, a cure, a dielectric cover, a carbon layer, inspection with a trace
 * reading, a heat-press transfer onto a TPU sheet and conductive-adhesive parts with their cure.
 * For the bench script's keystroke budget (40 steps, well under 5 ms).
 *
 * @example buildFortyStepRecipe().steps.length // → 40
 */
export function buildFortyStepRecipe(): RecipeCheckInput {
  const silver = makeInk({ id: 1, name: 'Fixture silver ink', solvents: [{ name: 'Ethylene glycol', casNumber: '107-21-1', hazardCodes: ['H302', 'H373'], pictograms: ['GHS07', 'GHS08'], signalWord: 'Warning' }] });
  const dielectric = makeInk({ id: 2, name: 'Fixture dielectric ink', function: 'dielectric', sheetResistanceOhmPerSq: null, surfaceTensionMilliNPerM: 32, surfaceTensionDispersiveMilliNPerM: 28, surfaceTensionPolarMilliNPerM: 4, viscosityMilliPaS: 12 });
  const carbon = makeInk({ id: 3, name: 'Fixture carbon ink', sheetResistanceOhmPerSq: 40, cureReferenceTempC: 120, cureReferenceMinutes: 20, activationEnergyKJPerMol: 60 });
  const tpu = makeSubstrate({ id: 2, name: 'Fixture TPU sheet', substrateClass: 'tpu-film', maxContinuousTempC: 110, maxShortExposureTempC: 160, maxShortExposureSeconds: 30, surfaceEnergyDispersiveMilliNPerM: 38, surfaceEnergyPolarMilliNPerM: 8, waterContactAngleDeg: null, diiodomethaneContactAngleDeg: null });
  const out: RecipeStep[] = [
    steps.treatment('wipe-01', { method: 'solvent-wipe', solvent: { name: 'Isopropanol', casNumber: '67-63-0', hazardCodes: ['H225', 'H319', 'H336'], pictograms: ['GHS02', 'GHS07'], signalWord: 'Danger' } }),
    steps.treatment('plasma-01', { targetSurfaceEnergyMilliNPerM: 62, targetWaterContactAngleDeg: 30, maxWaitBeforePrintMinutes: 60 }),
  ];
  for (let layer = 1; layer <= 6; layer += 1) {
    out.push(steps.print(`silver-${layer}`, { inkId: 1, channel: 'C1', passes: 1, platenTempC: 40, pieceAreaMm2: 900, printedAreaFraction: 0.2 }));
    out.push(steps.dry(`ag-dry-${layer}`, { temperatureC: 90, heatSourceId: 1 }, { minMinutes: 5, maxMinutes: 10 }));
  }
  out.push(steps.cure('ag-cure', { temperatureC: 140, minutes: 45, heatSourceId: 1, rampCPerMinute: 10 }));
  out.push(steps.inspect('ag-inspect', { measure: 'Trace resistance' }, { readingSpecs: [makeReadingSpec({ id: 'r-heater', traceLengthMm: 250, traceWidthMm: 1, upperLimit: 3 })] }));
  out.push(steps.treatment('plasma-02', { targetSurfaceEnergyMilliNPerM: 58 }));
  for (let layer = 1; layer <= 4; layer += 1) {
    out.push(steps.print(`cover-${layer}`, { inkId: 2, channel: 'C2', dpi: 720 }));
    out.push(steps.dry(`cover-dry-${layer}`, { temperatureC: 100, heatSourceId: 1 }, { minMinutes: 10 }));
  }
  out.push(steps.cure('cover-cure', { temperatureC: 130, minutes: 30, heatSourceId: 1 }));
  for (let layer = 1; layer <= 3; layer += 1) {
    out.push(steps.print(`carbon-${layer}`, { inkId: 3, channel: 'C3', dpi: 600 }));
    out.push(steps.dry(`carbon-dry-${layer}`, { temperatureC: 70 }, { minMinutes: 15 }));
  }
  out.push(steps.cure('carbon-cure', { temperatureC: 120, minutes: 20, heatSourceId: 1 }));
  out.push(steps.inspect('final-inspect', {}, { readingSpecs: [makeReadingSpec({ id: 'r-carbon', traceLengthMm: 20, traceWidthMm: 2, lowerLimit: 100, upperLimit: 200 })] }));
  out.push(steps.transfer('heat-press', { temperatureC: 150, seconds: 20, heatSourceId: 2 }));
  out.push(steps.inspect('after-press'));
  out.push(steps.attach('attach-parts', { method: 'conductive-adhesive', parts: [{ name: 'LED 0603', quantity: 4, placement: '' }] }));
  out.push(steps.cure('adhesive-cure', { temperatureC: 90, minutes: 20, heatSourceId: 1 }));
  while (out.length < 40) out.push(steps.inspect(`check-${out.length + 1}`));
  return {
    setup: makeSetup({ receivingSubstrateId: 2, channelPlan: [{ channel: 'C1', inkId: 1 }, { channel: 'C2', inkId: 2 }, { channel: 'C3', inkId: 3 }], heatSourceIds: [1, 2] }),
    steps: out,
    inks: [silver, dielectric, carbon],
    substrates: [makeSubstrate(), tpu],
    printers: [makePrinter()],
    heatSources: [makeHeatSource(), makeHeatSource({ id: 2, name: 'Fixture heat press', kind: 'heat-press', maxTempC: 220 })],
  };
}

/**
 * The checks of one family for an input (test convenience).
 * @example checksOf('jettability', makeInput({ steps: [steps.print('p1')] }))[0]?.status // → 'pass'
 */
export function checksOf(family: ProcessCheck['family'], input: RecipeCheckInput): ProcessCheck[] {
  return recipeChecks(input).filter((c) => c.family === family);
}
