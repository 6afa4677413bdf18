import { describe, expect, it } from 'vitest';

import type { RecipeStep } from '../../schemas/recipe-step.schema';
import { checksOf, makeInk, makeInput, makeSetup, steps } from './test-fixtures';

// Order rules are product rules (what a lab would never do), no source needed. Inks (invented):
// 1 silver conductor, 2 dielectric, 3 carbon conductor, 4 graphic.
const inks = [
  makeInk({ id: 1, name: 'Silver' }),
  makeInk({ id: 2, name: 'Cover', function: 'dielectric' }),
  makeInk({ id: 3, name: 'Carbon' }),
  makeInk({ id: 4, name: 'Colour', function: 'graphic' }),
];
const silver = (id: string) => steps.print(id, { inkId: 1 });
const cover = (id: string) => steps.print(id, { inkId: 2 });
const judge = (recipe: RecipeStep[], receivingSubstrateId: number | null = 2) =>
  checksOf('sequence', makeInput({ inks, setup: makeSetup({ receivingSubstrateId }), steps: recipe })).map((c) => `${c.id}=${c.status}`);

describe('sequenceChecks', () => {
  // prettier-ignore
  it.each([
    { name: 'every layer dries and parts go on last', recipe: [silver('a'), steps.dry('d'), steps.cure('c'), cover('b'), steps.dry('d2'), steps.attach('parts')], expected: ['sequence:order=pass'] },
    { name: 'a pass prints over a wet layer', recipe: [silver('a'), silver('b')], expected: ['sequence:b:wet-on-wet=blocked'] },
    { name: 'a cover goes over dried, uncured silver', recipe: [silver('a'), steps.dry('d'), cover('b')], expected: ['sequence:b:over-uncured:ink-1=warning'] },
    { name: 'a second conductor goes over dried, uncured silver', recipe: [silver('a'), steps.dry('d'), steps.print('b', { inkId: 3 })], expected: ['sequence:b:over-uncured:ink-1=warning'] },
    { name: 'more of the same silver goes over dried silver (layer build-up)', recipe: [silver('a'), steps.dry('d'), silver('b')], expected: ['sequence:order=pass'] },
    { name: 'a graphic ink goes over dried silver', recipe: [silver('a'), steps.dry('d'), steps.print('b', { inkId: 4 })], expected: ['sequence:order=pass'] },
    { name: 'a pass prints after parts are attached', recipe: [silver('a'), steps.cure('c'), steps.attach('parts'), cover('b')], expected: ['sequence:b:after-parts=blocked'] },
    { name: 'conductive adhesive has no cure after it', recipe: [silver('a'), steps.cure('c'), steps.attach('glue', { method: 'conductive-adhesive' })], expected: ['sequence:glue:adhesive-cure=blocked'] },
    { name: 'conductive adhesive is cured after', recipe: [silver('a'), steps.attach('glue', { method: 'conductive-adhesive' }), steps.cure('c')], expected: ['sequence:order=pass'] },
    { name: 'a treatment has no print pass after it', recipe: [silver('a'), steps.cure('c'), steps.treatment('t')], expected: ['sequence:t:unused-treatment=warning'] },
  ])('when $name, then $expected', ({ recipe, expected }) => {
    expect(judge(recipe)).toEqual(expected);
  });

  it('when a transfer runs with no receiving substrate in the setup, then it is blocked', () => {
    expect(judge([silver('a'), steps.cure('c'), steps.transfer('press')], null)).toEqual(['sequence:press:no-receiver=blocked']);
  });

  it.each([
    // Minutes between are estimated from the steps' times (timeline): a 45 min cure vs a 30 or 60 min window
    { wait: 30, expected: ['sequence:t:treatment-wait=warning'] },
    { wait: 60, expected: ['sequence:order=pass'] },
  ])('when the treatment holds $wait min and a 45 min cure sits before the print, then $expected', ({ wait, expected }) => {
    expect(judge([steps.treatment('t', { maxWaitBeforePrintMinutes: wait }), steps.cure('c', { minutes: 45 }), silver('a'), steps.cure('c2')])).toEqual(expected);
  });

  it('when the recipe has no steps, then no sequence check is made', () => {
    expect(judge([])).toEqual([]);
  });
});
