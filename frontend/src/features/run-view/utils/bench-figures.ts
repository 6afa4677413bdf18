import type { RecipeStep, RunDetail } from '@tracewright/shared';
import { numberText as n } from '@tracewright/shared';

export type BenchFigure = { label: string; value: string; unit: string };
export type BenchFact = { label: string; text: string };

const METHOD_WORDS: Record<string, string> = {
  plasma: 'Plasma',
  corona: 'Corona',
  'uv-ozone': 'UV-ozone',
  'primer-coat': 'Primer coat',
  'solvent-wipe': 'Solvent wipe',
  air: 'Air dry',
  oven: 'Oven',
  'hot-plate': 'Hot plate',
  'heat-gun': 'Heat gun',
  'z-axis-tape': 'Z-axis conductive tape',
  'conductive-thread': 'Conductive thread',
  'low-temp-solder': 'Low-temperature solder',
  'conductive-adhesive': 'Conductive adhesive',
};

type Context = Pick<RunDetail, 'inks' | 'equipment'>;

const fig = (label: string, value: number | null, unit: string): BenchFigure[] => (value === null ? [] : [{ label, value: n(value), unit }]);
const fact = (label: string, text: string | null | undefined): BenchFact[] => (text ? [{ label, text }] : []);
const method = (m: string) => METHOD_WORDS[m] ?? m;

function machine(context: Context, id: number | null): string | null {
  if (id === null) return null;
  return context.equipment.find((e) => e.kind === 'heat-source' && e.id === id)?.name ?? `Heat source #${id}`;
}

function timeWindow(step: RecipeStep): BenchFigure[] {
  const { minMinutes: lo, maxMinutes: hi } = step;
  if (lo !== null && hi !== null) return [{ label: 'Time', value: lo === hi ? n(lo) : `${n(lo)}–${n(hi)}`, unit: 'min' }];
  if (lo !== null) return [{ label: 'At least', value: n(lo), unit: 'min' }];
  if (hi !== null) return [{ label: 'At most', value: n(hi), unit: 'min' }];
  return [];
}

/**
 * The settings an operator sets at the bench, split into big numbers with units (°C, min, dpi,
 * channel, passes, kPa, s) and short facts (method, ink, machine), exactly as the recipe says.
 */
export function benchFigures(step: RecipeStep, context: Context): { figures: BenchFigure[]; facts: BenchFact[] } {
  switch (step.kind) {
    case 'surface-treatment': {
      const p = step.params;
      return {
        figures: [...fig('Target surface energy', p.targetSurfaceEnergyMilliNPerM, 'mN/m'), ...fig('Target water angle', p.targetWaterContactAngleDeg, '°'), ...fig('Print within', p.maxWaitBeforePrintMinutes, 'min'), ...timeWindow(step)],
        facts: [...fact('Method', method(p.method)), ...fact('Solvent', p.solvent?.name), ...fact('Settings', p.settings)],
      };
    }
    case 'print-pass': {
      const p = step.params;
      const ink = context.inks.find((i) => i.id === p.inkId)?.name ?? `Ink #${p.inkId}`;
      return {
        figures: [{ label: 'Channel', value: p.channel, unit: '' }, ...fig('Resolution', p.dpi, 'dpi'), { label: 'Passes', value: String(p.passes), unit: p.passes === 1 ? 'pass' : 'passes' }, ...fig('Platen', p.platenTempC, '°C'), ...timeWindow(step)],
        facts: [...fact('Ink', ink), ...fact('Nozzle check', p.nozzleCheckRequired ? 'Required before printing' : null)],
      };
    }
    case 'dry':
      return { figures: [...fig('Temperature', step.params.temperatureC, '°C'), ...timeWindow(step)], facts: [...fact('Method', method(step.params.method)), ...fact('Machine', machine(context, step.params.heatSourceId))] };
    case 'cure': {
      const p = step.params;
      return { figures: [...fig('Temperature', p.temperatureC, '°C'), ...fig('At temperature', p.minutes, 'min'), ...fig('Ramp', p.rampCPerMinute, '°C/min'), ...timeWindow(step)], facts: fact('Machine', machine(context, p.heatSourceId)) };
    }
    case 'transfer': {
      const p = step.params;
      return { figures: [...fig('Temperature', p.temperatureC, '°C'), ...fig('Pressure', p.pressureKPa, 'kPa'), ...fig('Press time', p.seconds, 's')], facts: [...fact('Press', machine(context, p.heatSourceId)), ...fact('Peel', p.peel === 'hot' ? 'Hot — peel straight away' : 'Cold — let it cool first')] };
    }
    case 'attach-parts':
      return { figures: [...fig('Working temperature', step.params.temperatureC, '°C'), ...timeWindow(step)], facts: fact('Method', method(step.params.method)) };
    case 'inspect':
      return { figures: timeWindow(step), facts: [...fact('Look for', step.params.lookFor), ...fact('Measure', step.params.measure)] };
  }
}
