import { describe, expect, it } from 'vitest';

import type { Solvent } from '../../schemas/ghs.schema';
import type { RecipeStep } from '../../schemas/recipe-step.schema';
import { makeHeatSource, makeInk, makeReadingSpec, steps } from '../recipe/test-fixtures';
import { stepTimeText } from './step-parameters';
import { travellerSteps } from './traveller';

// Ethanol: harmonised CLP entry H225, GHS02, Danger (REFERENCES §7.2, ECHA C&L).
const ETHANOL: Solvent = { name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['H225'], pictograms: ['GHS02'], signalWord: 'Danger' };
// Invented lab records (fixtures), named so the texts are easy to read.
const context = {
  inks: [makeInk({ id: 1, name: 'Silver ink', solvents: [ETHANOL] })],
  heatSources: [makeHeatSource({ id: 1, name: 'Oven A' }), makeHeatSource({ id: 2, name: 'Press B', kind: 'heat-press' })],
};
const one = (step: RecipeStep) => travellerSteps([step], context)[0];

describe('travellerSteps', () => {
  // prettier-ignore
  it.each([
    { kind: 'a plasma treatment', step: steps.treatment('t', { settings: '50 W, 60 s', targetSurfaceEnergyMilliNPerM: 62, targetWaterContactAngleDeg: 30, maxWaitBeforePrintMinutes: 60 }),
      expected: ['plasma', '50 W, 60 s', 'target surface energy 62 mN/m', 'target water contact angle 30°', 'print within 60 min'] },
    { kind: 'a print pass', step: steps.print('p', { passes: 2, platenTempC: 40 }), expected: ['Silver ink', 'channel C1', '1000 dpi', '2 passes', 'platen 40 °C', 'nozzle check first'] },
    { kind: 'a print pass of an unknown ink', step: steps.print('p', { inkId: 9, nozzleCheckRequired: false }), expected: ['ink #9', 'channel C1', '1000 dpi', '1 pass'] },
    { kind: 'a dry', step: steps.dry('d', { temperatureC: 90, heatSourceId: 1 }), expected: ['oven', 'Oven A', '90 °C'] },
    { kind: 'a cure', step: steps.cure('c', { temperatureC: 150, minutes: 30, rampCPerMinute: 5, heatSourceId: 1 }), expected: ['Oven A', '150 °C', '30 min at temperature', 'ramp 5 °C/min'] },
    { kind: 'a transfer', step: steps.transfer('x', { heatSourceId: 2, temperatureC: 130, pressureKPa: 300, seconds: 15, peel: 'hot' }), expected: ['Press B', '130 °C', '300 kPa', '15 s', 'peel hot'] },
    { kind: 'a solder attach', step: steps.attach('a', { method: 'low-temp-solder', temperatureC: 170, parts: [{ name: 'LED 0603', quantity: 4, placement: 'D1–D4' }] }),
      expected: ['low-temperature solder', '170 °C', '4 × LED 0603 (D1–D4)'] },
    { kind: 'an inspection', step: steps.inspect('i', { lookFor: 'cracks at bends', measure: 'trace resistance' }), expected: ['look for: cracks at bends', 'measure: trace resistance'] },
  ])('when the step is $kind, then its parameters read $expected', ({ step, expected }) => {
    expect(one(step)?.parameters).toEqual(expected);
  });

  it('when steps are listed, then they are numbered in order with their kind label and title', () => {
    const result = travellerSteps([steps.treatment('t', {}, { title: 'Plasma' }), steps.print('p', {}, { title: 'Print silver' })], context);
    expect(result.map((s) => [s.number, s.kindLabel, s.title])).toEqual([[1, 'Surface treatment', 'Plasma'], [2, 'Print pass', 'Print silver']]);
  });

  it('when a step has reading specs, then each shows its limits and target', () => {
    const spec = makeReadingSpec({ id: 'r-heater', lowerLimit: 8, upperLimit: 12, target: 10, perPiece: true });
    const [reading] = one(steps.inspect('i', {}, { readingSpecs: [spec] }))?.readings ?? [];
    expect(reading).toEqual({ id: 'r-heater', name: 'Trace resistance', unit: 'Ω', limitsText: '8–12 Ω', targetText: 'target 10 Ω', required: true, perPiece: true });
  });

  it('when a print uses a silver ink with ethanol and the engineer adds notes, then derived cautions come first and repeats show once', () => {
    const step = steps.print('p', {}, { safetyNotes: ['Wear the blue apron.', 'wear the blue apron. '] });
    expect(one(step)?.cautions.map((c) => c.code)).toEqual(['ghs:64-17-5', 'no-ignition', 'nanoparticle', 'sds', 'custom:wear the blue apron.']);
  });

  it('when a cure runs at 150 °C, then its hot-surface caution names the temperature', () => {
    expect(one(steps.cure('c', { temperatureC: 150 }))?.cautions[0]?.text).toContain('150 °C');
  });
});

describe('stepTimeText', () => {
  it.each([
    { min: 10, max: 15, text: '10–15 min' },
    { min: 10, max: 10, text: '10 min' },
    { min: 10, max: null, text: 'at least 10 min' },
    { min: null, max: 15, text: 'at most 15 min' },
    { min: null, max: null, text: null },
  ])('when the step takes [$min, $max] min, then it reads $text', ({ min, max, text }) => {
    expect(stepTimeText({ minMinutes: min, maxMinutes: max })).toBe(text);
  });
});
