import { describe, expect, it } from 'vitest';

import { expectRelativelyClose } from '../../process/test-support';
import { steps } from './test-fixtures';
import { DEFAULT_STEP_MINUTES, HANDLING_ALLOWANCE_MINUTES, inkUsePerPiece, recipeTimeline, stepDurationMinutes, stepTime } from './timeline';

// Durations, defaults and the handling allowance are our own rules (common practice, no source).

describe('stepDurationMinutes', () => {
  // prettier-ignore
  it.each([
    { name: 'a 30 min cure at 150 °C with a 5 °C/min ramp', step: steps.cure('c', { temperatureC: 150, minutes: 30, rampCPerMinute: 5 }), minutes: 30 + 130 / 5 },
    { name: 'a 30 min cure without a ramp', step: steps.cure('c', { minutes: 30 }), minutes: 30 },
    { name: 'a cure at 15 °C with a ramp (nothing to ramp up)', step: steps.cure('c', { temperatureC: 15, minutes: 30, rampCPerMinute: 5 }), minutes: 30 },
    { name: 'a 15 s press', step: steps.transfer('t', { seconds: 15 }), minutes: 0.25 },
    { name: 'a dry of 5–12 min', step: steps.dry('d', {}, { minMinutes: 5, maxMinutes: 12 }), minutes: 5 },
    { name: 'a dry of at most 12 min', step: steps.dry('d', {}, { minMinutes: null, maxMinutes: 12 }), minutes: 12 },
    { name: 'a dry with no time', step: steps.dry('d', {}, { minMinutes: null }), minutes: DEFAULT_STEP_MINUTES.dry },
    { name: 'a three-pass print with no time', step: steps.print('p', { passes: 3 }), minutes: 3 * DEFAULT_STEP_MINUTES['print-pass'] },
    { name: 'an inspection with no time', step: steps.inspect('i'), minutes: DEFAULT_STEP_MINUTES.inspect },
  ])('when the step is $name, then it takes $minutes min', ({ step, minutes }) => {
    expect(stepDurationMinutes(step)).toBeCloseTo(minutes, 10);
  });
});

describe('stepTime', () => {
  // prettier-ignore
  it.each([
    { name: 'an oven dry of 10 min', step: steps.dry('d', {}, { minMinutes: 10 }), expected: { minutes: 10, handsOnMinutes: HANDLING_ALLOWANCE_MINUTES, waitingMinutes: 10 - HANDLING_ALLOWANCE_MINUTES } },
    { name: 'a 1 min cure (allowance capped at the step)', step: steps.cure('c', { minutes: 1 }), expected: { minutes: 1, handsOnMinutes: 1, waitingMinutes: 0 } },
    { name: 'a 5 min plasma treatment', step: steps.treatment('t', {}, { minMinutes: 5 }), expected: { minutes: 5, handsOnMinutes: 5, waitingMinutes: 0 } },
    { name: 'a 20 min dry with 4 min hands-on given', step: steps.dry('d', {}, { minMinutes: 20, handsOnMinutes: 4 }), expected: { minutes: 20, handsOnMinutes: 4, waitingMinutes: 16 } },
    { name: 'a 15 s press with 3 min hands-on given (loading and peeling)', step: steps.transfer('t', { seconds: 15 }, { handsOnMinutes: 3 }), expected: { minutes: 3, handsOnMinutes: 3, waitingMinutes: 0 } },
  ])('when the step is $name, then the split is $expected', ({ step, expected }) => {
    expect(stepTime(step)).toEqual({ stepId: step.id, ...expected });
  });
});

describe('recipeTimeline', () => {
  it('when a treatment, a print and a cure follow each other, then their minutes add up', () => {
    const timeline = recipeTimeline([steps.treatment('t', {}, { minMinutes: 5 }), steps.print('p', {}, { minMinutes: 8 }), steps.cure('c', { minutes: 30 })]);
    expect(timeline).toMatchObject({ totalMinutes: 43, handsOnMinutes: 5 + 8 + HANDLING_ALLOWANCE_MINUTES, waitingMinutes: 30 - HANDLING_ALLOWANCE_MINUTES });
    expect(timeline.steps.map((s) => s.stepId)).toEqual(['t', 'p', 'c']);
  });

  it('when there are no steps, then everything is zero', () => {
    expect(recipeTimeline([])).toEqual({ totalMinutes: 0, handsOnMinutes: 0, waitingMinutes: 0, steps: [] });
  });
});

describe('inkUsePerPiece', () => {
  it('when 10 pL drops print a 100 mm² piece half-covered at 1000 dpi in two passes, then it uses 1.55 µL', () => {
    // REFERENCES §3.2 [D]: 10 pL on a 25.4 µm grid (1000 dpi) is a 15.50 µm wet film; 15.50 µm × 100 mm² × 0.5 × 2 = 1.55 mm³ = 1.55 µL
    const step = steps.print('p', { inkId: 7, dpi: 1000, passes: 2, pieceAreaMm2: 100, printedAreaFraction: 0.5 });
    expectRelativelyClose(inkUsePerPiece(step, { id: 7 }, { dropVolumePl: 10 }), 1.55, 0.001);
  });

  // prettier-ignore
  it.each([
    { name: 'the piece area is missing', step: steps.print('p', { inkId: 7, printedAreaFraction: 0.5 }), inkId: 7 },
    { name: 'the printed fraction is missing', step: steps.print('p', { inkId: 7, pieceAreaMm2: 100 }), inkId: 7 },
    { name: 'the step prints another ink', step: steps.print('p', { inkId: 8, pieceAreaMm2: 100, printedAreaFraction: 0.5 }), inkId: 7 },
    { name: 'the step is not a print pass', step: steps.cure('c'), inkId: 7 },
  ])('when $name, then the ink use is null', ({ step, inkId }) => {
    expect(inkUsePerPiece(step, { id: inkId }, { dropVolumePl: 10 })).toBeNull();
  });
});
