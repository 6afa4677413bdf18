import { dropSpacingUm } from '../../process/line-geometry';
import type { Printer } from '../../schemas/equipment.schema';
import type { Ink } from '../../schemas/material.schema';
import type { RecipeStep, StepKind } from '../../schemas/recipe-step.schema';

/**
 * Minutes a step takes when the engineer gave no time: common practice, no source. A print pass
 * counts per pass; cure and transfer always carry their own times, so theirs are never used.
 */
export const DEFAULT_STEP_MINUTES: Record<StepKind, number> = {
  'surface-treatment': 5,
  'print-pass': 5,
  dry: 10,
  cure: 30,
  transfer: 1,
  'attach-parts': 15,
  inspect: 5,
};

/** Loading and unloading an oven or hot plate: the hands-on part of a dry or cure (common practice, no source). */
export const HANDLING_ALLOWANCE_MINUTES = 2;

/** A cure ramp starts from the room: 20 °C (common practice, no source). */
export const RAMP_START_TEMP_C = 20;

const WAITING_KINDS: ReadonlySet<StepKind> = new Set(['dry', 'cure']);

export interface StepTime {
  stepId: string;
  minutes: number;
  handsOnMinutes: number;
  waitingMinutes: number;
}

export interface RecipeTimeline {
  totalMinutes: number;
  handsOnMinutes: number;
  waitingMinutes: number;
  steps: StepTime[];
}

/**
 * How long one step takes, before hands-on time is considered: cure = time at temperature plus
 * the ramp from 20 °C when a ramp is given; transfer = press seconds / 60; any other step its
 * shortest time if given, else its longest, else the default for its kind.
 *
 * @example
 * // cure 30 min at 150 °C with a 5 °C/min ramp → 30 + (150 − 20)/5 = 56 min
 * stepDurationMinutes({ kind: 'cure', params: { temperatureC: 150, minutes: 30, rampCPerMinute: 5, … }, … }) // → 56
 */
export function stepDurationMinutes(step: RecipeStep): number {
  switch (step.kind) {
    case 'cure': {
      const { minutes, rampCPerMinute, temperatureC } = step.params;
      const ramp = rampCPerMinute !== null && temperatureC > RAMP_START_TEMP_C ? (temperatureC - RAMP_START_TEMP_C) / rampCPerMinute : 0;
      return minutes + ramp;
    }
    case 'transfer':
      return step.params.seconds / 60;
    case 'print-pass':
      return step.minMinutes ?? step.maxMinutes ?? DEFAULT_STEP_MINUTES['print-pass'] * step.params.passes;
    default:
      return step.minMinutes ?? step.maxMinutes ?? DEFAULT_STEP_MINUTES[step.kind];
  }
}

/**
 * One step's time split into hands-on and waiting. Given hands-on time wins (and stretches the
 * step if it is longer); otherwise dry and cure wait apart from a 2-minute handling allowance,
 * and every other kind is hands-on throughout.
 *
 * @example
 * // dry in an oven, 10–15 min, no hands-on time given → { minutes: 10, handsOnMinutes: 2, waitingMinutes: 8 }
 * stepTime(dryStep)
 */
export function stepTime(step: RecipeStep): StepTime {
  const duration = stepDurationMinutes(step);
  let handsOn: number;
  if (step.handsOnMinutes !== null) handsOn = step.handsOnMinutes;
  else if (WAITING_KINDS.has(step.kind)) handsOn = Math.min(HANDLING_ALLOWANCE_MINUTES, duration);
  else handsOn = duration;
  const minutes = Math.max(duration, handsOn);
  return { stepId: step.id, minutes, handsOnMinutes: handsOn, waitingMinutes: minutes - handsOn };
}

/**
 * Total, hands-on and waiting minutes of a recipe, step by step (steps run one after another).
 *
 * @example
 * // plasma 5 min (hands-on) + print 1 pass (5 min) + cure 30 min at 120 °C (2 min handling)
 * recipeTimeline([plasma, print, cure])
 * // → { totalMinutes: 40, handsOnMinutes: 12, waitingMinutes: 28, steps: [{ stepId: 'plasma-1', minutes: 5, … }, …] }
 */
export function recipeTimeline(steps: readonly RecipeStep[]): RecipeTimeline {
  const times = steps.map(stepTime);
  let totalMinutes = 0;
  let handsOnMinutes = 0;
  for (const t of times) {
    totalMinutes += t.minutes;
    handsOnMinutes += t.handsOnMinutes;
  }
  return { totalMinutes, handsOnMinutes, waitingMinutes: totalMinutes - handsOnMinutes, steps: times };
}

/**
 * Ink one piece takes in a print pass, µL: (piece area / drop spacing²) drops × printed-area
 * fraction × drop volume × passes. Null when the step is not a print pass, prints another ink,
 * or lacks its piece area or printed fraction. Nozzle purges and spitting are not counted.
 *
 * @example
 * // 100 mm² piece, half printed, 1000 dpi (25.4 µm), 10 pL drops, 2 passes
 * // → 155 000 × 0.5 × 10 pL × 2 = 1.55 µL (= 15.5 µm wet film × 100 mm² × 0.5 × 2)
 * inkUsePerPiece(printStep, { id: 7 }, { dropVolumePl: 10 }) // → 1.55
 */
export function inkUsePerPiece(step: RecipeStep, ink: Pick<Ink, 'id'>, printer: Pick<Printer, 'dropVolumePl'>): number | null {
  if (step.kind !== 'print-pass' || step.params.inkId !== ink.id) return null;
  const { pieceAreaMm2, printedAreaFraction, dpi, passes } = step.params;
  if (pieceAreaMm2 === null || printedAreaFraction === null) return null;
  const spacingUm = dropSpacingUm(dpi);
  const drops = (pieceAreaMm2 * UM2_PER_MM2) / (spacingUm * spacingUm);
  return (drops * printedAreaFraction * printer.dropVolumePl * passes) / PL_PER_UL;
}

const UM2_PER_MM2 = 1e6;
const PL_PER_UL = 1e6;
