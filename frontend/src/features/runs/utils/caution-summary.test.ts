import { describe, expect, it } from 'vitest';

import type { SafetyNote, TravellerStep } from '@tracewright/shared';

import { cautionSummary } from './caution-summary';

const step = (number: number, cautions: SafetyNote[]): TravellerStep => ({
  number,
  stepId: `step-${number}00`,
  kind: 'cure',
  kindLabel: 'Cure',
  title: `Step ${number}`,
  timeText: null,
  parameters: [],
  readings: [],
  cautions,
});
const hot = (tempC: number): SafetyNote => ({ code: 'hot-surface', text: `Hot surface at ${tempC} °C.`, severity: 'caution' });
const flammable: SafetyNote = { code: 'ghs:67-64-1', text: 'Acetone: highly flammable.', severity: 'danger' };

describe('cautionSummary', () => {
  it('when steps repeat a caution, then it is listed once with every step, dangers first', () => {
    const lines = cautionSummary([step(1, [hot(120)]), step(2, [flammable]), step(4, [hot(120)])]);

    expect(lines.map((l) => [l.note.text, l.stepNumbers])).toEqual([
      ['Acetone: highly flammable.', [2]],
      ['Hot surface at 120 °C.', [1, 4]],
    ]);
  });

  it('when one code carries different words, then each wording keeps its own line', () => {
    expect(cautionSummary([step(1, [hot(120)]), step(3, [hot(150)])])).toHaveLength(2);
  });
});
