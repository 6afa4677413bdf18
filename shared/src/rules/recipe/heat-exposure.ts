import type { RecipeStep } from '../../schemas/recipe-step.schema';
import { stepDurationMinutes } from './timeline';

/**
 * A dry, platen or working temperature above this heats the part (common practice, no source):
 * at or below it the step is at room temperature.
 */
export const AMBIENT_TEMP_C = 25;

/** One step that holds the work at a temperature, with both ends of its time. */
export interface HeatExposure {
  index: number;
  step: RecipeStep;
  tempC: number;
  /** Worst case for the substrate: the longest the step may last, in seconds. */
  longestSeconds: number;
  /** What a cure may count on: the shortest time the recipe guarantees, in minutes (0 if none given). */
  shortestMinutes: number;
  heatSourceId: number | null;
  /** Plain words, e.g. "cure", "heat press", "heated platen". */
  what: string;
}

/**
 * The heat a step applies, or null when it applies none: a cure or transfer always; a dry, a
 * print pass's platen or an attach's working temperature when above 25 °C.
 *
 * @example
 * // cure 30 min at 150 °C → { tempC: 150, longestSeconds: 1800, shortestMinutes: 30, what: 'cure', … }
 * heatExposureOf(cureStep, 4)
 */
export function heatExposureOf(step: RecipeStep, index: number): HeatExposure | null {
  const held = (tempC: number, heatSourceId: number | null, what: string): HeatExposure => ({
    index,
    step,
    tempC,
    longestSeconds: (step.maxMinutes ?? stepDurationMinutes(step)) * 60,
    shortestMinutes: step.minMinutes ?? 0,
    heatSourceId,
    what,
  });
  switch (step.kind) {
    case 'cure':
      return { index, step, tempC: step.params.temperatureC, longestSeconds: step.params.minutes * 60, shortestMinutes: step.params.minutes, heatSourceId: step.params.heatSourceId, what: 'cure' };
    case 'transfer':
      return { index, step, tempC: step.params.temperatureC, longestSeconds: step.params.seconds, shortestMinutes: step.params.seconds / 60, heatSourceId: step.params.heatSourceId, what: 'heat press' };
    case 'dry':
      return step.params.temperatureC > AMBIENT_TEMP_C ? held(step.params.temperatureC, step.params.heatSourceId, `${step.params.method.replace('-', ' ')} dry`) : null;
    case 'print-pass': {
      const platen = step.params.platenTempC;
      return platen !== null && platen > AMBIENT_TEMP_C ? held(platen, null, 'heated platen') : null;
    }
    case 'attach-parts': {
      const t = step.params.temperatureC;
      return t !== null && t > AMBIENT_TEMP_C ? held(t, null, 'working temperature') : null;
    }
    default:
      return null;
  }
}

/**
 * Every heat exposure of a recipe, in step order.
 * @example heatExposures([print, dry80, cure150]).map((h) => h.tempC) // → [80, 150]
 */
export function heatExposures(steps: readonly RecipeStep[]): HeatExposure[] {
  const out: HeatExposure[] = [];
  steps.forEach((step, i) => {
    const exposure = heatExposureOf(step, i);
    if (exposure) out.push(exposure);
  });
  return out;
}
