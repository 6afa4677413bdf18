import { STEP_KIND_LABELS, type Printer, type RecipeStep, type StepKind, type VersionSetup } from '@tracewright/shared';

import { newId } from './step-id';

const ID_PREFIX: Record<StepKind, string> = {
  'surface-treatment': 'treat',
  'print-pass': 'print',
  dry: 'dry',
  cure: 'cure',
  transfer: 'transfer',
  'attach-parts': 'attach',
  inspect: 'inspect',
};

/**
 * Values the engineer must type (temperatures, times, pressures) start empty: the form asks for
 * them and the checks leave the step out until they are there. We never invent a process value.
 */
const ASK = null as unknown as number;

function paramsFor(kind: StepKind, setup: VersionSetup, printer: Printer | undefined): RecipeStep['params'] {
  switch (kind) {
    case 'surface-treatment':
      return { method: 'plasma', treaterId: null, settings: '', targetSurfaceEnergyMilliNPerM: null, targetWaterContactAngleDeg: null, maxWaitBeforePrintMinutes: null, solvent: null };
    case 'print-pass': {
      // The first loaded channel is the likeliest next layer; the engineer changes it when not.
      const loaded = setup.channelPlan[0];
      return {
        inkId: loaded?.inkId ?? ASK,
        channel: loaded?.channel ?? '',
        artworkFileId: null,
        dpi: printer?.nativeDpi ?? ASK,
        passes: 1,
        platenTempC: null,
        nozzleCheckRequired: true,
        printedAreaFraction: null,
        pieceAreaMm2: null,
      };
    }
    case 'dry':
      return { method: 'air', heatSourceId: null, temperatureC: ASK };
    case 'cure':
      return { heatSourceId: null, temperatureC: ASK, minutes: ASK, rampCPerMinute: null };
    case 'transfer':
      return { heatSourceId: null, temperatureC: ASK, pressureKPa: ASK, seconds: ASK, peel: 'cold' };
    case 'attach-parts':
      return { method: 'z-axis-tape', parts: [], temperatureC: null };
    case 'inspect':
      return { lookFor: '', measure: '' };
  }
}

/** A new step of a kind, titled by its kind, with the setup's printer and first channel filled in. */
export function blankStep(kind: StepKind, setup: VersionSetup, printers: readonly Printer[]): RecipeStep {
  const printer = printers.find((p) => p.id === setup.printerId);
  return {
    id: newId(ID_PREFIX[kind]),
    kind,
    title: STEP_KIND_LABELS[kind],
    instructions: '',
    minMinutes: null,
    maxMinutes: null,
    handsOnMinutes: null,
    readingSpecs: [],
    safetyNotes: [],
    params: paramsFor(kind, setup, printer),
  } as RecipeStep;
}

/** A copy with fresh ids (its readings too), titled so the two can be told apart. */
export function duplicateOf(step: RecipeStep): RecipeStep {
  const copy = structuredClone(step);
  copy.id = newId(ID_PREFIX[step.kind]);
  copy.title = `${step.title} (copy)`.slice(0, 120);
  copy.readingSpecs = copy.readingSpecs.map((spec) => ({ ...spec, id: newId('reading') }));
  return copy;
}
