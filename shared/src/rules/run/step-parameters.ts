import type { HeatSource } from '../../schemas/equipment.schema';
import type { Ink } from '../../schemas/material.schema';
import type { RecipeStep } from '../../schemas/recipe-step.schema';
import { numberText as n } from './text-format';

export type TravellerContext = {
  inks: readonly Pick<Ink, 'id' | 'name'>[];
  heatSources: readonly Pick<HeatSource, 'id' | 'name'>[];
};

const METHOD_WORDS: Record<string, string> = {
  plasma: 'plasma',
  corona: 'corona',
  'uv-ozone': 'UV-ozone',
  'primer-coat': 'primer coat',
  'solvent-wipe': 'solvent wipe',
  air: 'air dry',
  oven: 'oven',
  'hot-plate': 'hot plate',
  'heat-gun': 'heat gun',
  'z-axis-tape': 'z-axis conductive tape',
  'conductive-thread': 'conductive thread',
  'low-temp-solder': 'low-temperature solder',
  'conductive-adhesive': 'conductive adhesive',
};

function heatSourceText(id: number | null, context: TravellerContext): string[] {
  if (id === null) return [];
  return [context.heatSources.find((h) => h.id === id)?.name ?? `heat source #${id}`];
}

/**
 * A step's minimum and maximum time in words, or null when the recipe gives neither.
 * @example stepTimeText({ minMinutes: 10, maxMinutes: 15 }) // → '10–15 min'
 */
export function stepTimeText(step: Pick<RecipeStep, 'minMinutes' | 'maxMinutes'>): string | null {
  const { minMinutes: lo, maxMinutes: hi } = step;
  if (lo !== null && hi !== null) return lo === hi ? `${n(lo)} min` : `${n(lo)}–${n(hi)} min`;
  if (lo !== null) return `at least ${n(lo)} min`;
  if (hi !== null) return `at most ${n(hi)} min`;
  return null;
}

/**
 * The key parameters of a step as short texts with units (°C, min, dpi, channel, passes, kPa,
 * s), in the order an operator sets them up; values exactly as the engineer entered them.
 *
 * @example
 * stepParameterTexts(printStep, { inks: [{ id: 1, name: 'Silver ink' }], heatSources: [] })
 * // → ['Silver ink', 'channel C1', '1000 dpi', '2 passes', 'platen 40 °C', 'nozzle check first']
 */
export function stepParameterTexts(step: RecipeStep, context: TravellerContext): string[] {
  switch (step.kind) {
    case 'surface-treatment': {
      const p = step.params;
      return [
        METHOD_WORDS[p.method] ?? p.method,
        ...(p.solvent ? [p.solvent.name] : []),
        ...(p.settings ? [p.settings] : []),
        ...(p.targetSurfaceEnergyMilliNPerM !== null ? [`target surface energy ${n(p.targetSurfaceEnergyMilliNPerM)} mN/m`] : []),
        ...(p.targetWaterContactAngleDeg !== null ? [`target water contact angle ${n(p.targetWaterContactAngleDeg)}°`] : []),
        ...(p.maxWaitBeforePrintMinutes !== null ? [`print within ${n(p.maxWaitBeforePrintMinutes)} min`] : []),
      ];
    }
    case 'print-pass': {
      const p = step.params;
      const ink = context.inks.find((i) => i.id === p.inkId)?.name ?? `ink #${p.inkId}`;
      return [
        ink,
        `channel ${p.channel}`,
        `${n(p.dpi)} dpi`,
        p.passes === 1 ? '1 pass' : `${p.passes} passes`,
        ...(p.platenTempC !== null ? [`platen ${n(p.platenTempC)} °C`] : []),
        ...(p.nozzleCheckRequired ? ['nozzle check first'] : []),
      ];
    }
    case 'dry':
      return [METHOD_WORDS[step.params.method] ?? step.params.method, ...heatSourceText(step.params.heatSourceId, context), `${n(step.params.temperatureC)} °C`];
    case 'cure': {
      const p = step.params;
      const ramp = p.rampCPerMinute !== null ? [`ramp ${n(p.rampCPerMinute)} °C/min`] : [];
      return [...heatSourceText(p.heatSourceId, context), `${n(p.temperatureC)} °C`, `${n(p.minutes)} min at temperature`, ...ramp];
    }
    case 'transfer': {
      const p = step.params;
      return [...heatSourceText(p.heatSourceId, context), `${n(p.temperatureC)} °C`, `${n(p.pressureKPa)} kPa`, `${n(p.seconds)} s`, `peel ${p.peel}`];
    }
    case 'attach-parts': {
      const p = step.params;
      const parts = p.parts.map((part) => `${part.quantity} × ${part.name}${part.placement ? ` (${part.placement})` : ''}`);
      const temp = p.temperatureC !== null ? [`${n(p.temperatureC)} °C`] : [];
      return [METHOD_WORDS[p.method] ?? p.method, ...temp, ...parts];
    }
    case 'inspect': {
      const p = step.params;
      return [...(p.lookFor ? [`look for: ${p.lookFor}`] : []), ...(p.measure ? [`measure: ${p.measure}`] : [])];
    }
  }
}
