import type { Ink, RecipeStep } from '@tracewright/shared';

import { ATTACH_METHOD_LABELS, DRY_METHOD_LABELS, PEEL_LABELS, TREATMENT_METHOD_LABELS } from './step-labels';

const num = (value: number | null | undefined, unit: string) =>
  value === null || value === undefined || Number.isNaN(value) ? `— ${unit}` : `${value} ${unit}`;

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * The one line a step card shows under its title: the settings a person scans for.
 * @example stepSummary(cureAt150For30, inks) // → '150 °C · 30 min'
 */
export function stepSummary(step: RecipeStep, inks: readonly Pick<Ink, 'id' | 'name'>[]): string {
  switch (step.kind) {
    case 'surface-treatment':
      return TREATMENT_METHOD_LABELS[step.params.method] ?? '';
    case 'print-pass': {
      const ink = inks.find((i) => i.id === step.params.inkId)?.name ?? 'No ink picked';
      const channel = step.params.channel ? `channel ${step.params.channel}` : 'no channel';
      return [ink, channel, num(step.params.dpi, 'dpi'), plural(step.params.passes ?? 0, 'pass', 'passes')].join(' · ');
    }
    case 'dry':
      return [DRY_METHOD_LABELS[step.params.method], num(step.params.temperatureC, '°C')].join(' · ');
    case 'cure':
      return [num(step.params.temperatureC, '°C'), num(step.params.minutes, 'min')].join(' · ');
    case 'transfer':
      return [num(step.params.temperatureC, '°C'), num(step.params.pressureKPa, 'kPa'), num(step.params.seconds, 's'), PEEL_LABELS[step.params.peel]].join(' · ');
    case 'attach-parts':
      return [ATTACH_METHOD_LABELS[step.params.method], plural(step.params.parts.length, 'part', 'parts')].join(' · ');
    case 'inspect':
      return step.params.lookFor.split('\n')[0]?.slice(0, 80) ?? '';
  }
}
