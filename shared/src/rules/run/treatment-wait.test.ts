import { describe, expect, it } from 'vitest';

import { steps } from '../recipe/test-fixtures';
import { treatmentWaitExceeded } from './treatment-wait';

const at = (hhmm: string) => new Date(`2026-12-02T${hhmm}:00Z`);
const plasma = steps.treatment('plasma-1', { maxWaitBeforePrintMinutes: 60 });
const wipe = steps.treatment('wipe-1', { method: 'solvent-wipe', maxWaitBeforePrintMinutes: 30 });
const corona = steps.treatment('corona-1', { method: 'corona' });
const print1 = steps.print('print-1');
const dry1 = steps.dry('dry-1');
const print2 = steps.print('print-2');
const done = (stepId: string, hhmm: string) => ({ stepId, completedAt: at(hhmm) });

describe('treatmentWaitExceeded', () => {
  // prettier-ignore
  it.each([
    { name: 'the print starts 59 min after', printAt: '10:59', waited: 59, exceeded: false, waiting: false },
    { name: 'the print starts exactly 60 min after', printAt: '11:00', waited: 60, exceeded: false, waiting: false },
    { name: 'the print starts 65 min after', printAt: '11:05', waited: 65, exceeded: true, waiting: false },
    { name: 'the print has not started at 10:45', printAt: null, waited: 45, exceeded: false, waiting: true },
    { name: 'the print starts on a clock behind the treatment', printAt: '09:58', waited: 0, exceeded: false, waiting: false },
  ])('when plasma (≤ 60 min) is done at 10:00 and $name, then $waited min waited, exceeded $exceeded', ({ printAt, waited, exceeded, waiting }) => {
    const result = treatmentWaitExceeded([plasma, print1], [done('plasma-1', '10:00')], printAt ? at(printAt) : null, at('10:45'));
    expect(result).toEqual([{ treatmentStepId: 'plasma-1', printStepId: 'print-1', waitedMinutes: waited, maxMinutes: 60, isExceeded: exceeded, isWaiting: waiting }]);
  });

  // prettier-ignore
  it.each([
    { name: 'the treatment is not done yet', recipe: [plasma, print1], records: [], expected: [] },
    { name: 'the treatment has no longest wait', recipe: [corona, print1], records: [done('corona-1', '10:00')], expected: [] },
    { name: 'no print pass follows', recipe: [print1, plasma, dry1], records: [done('print-1', '09:00'), done('plasma-1', '10:00')], expected: [] },
    { name: 'its print pass is already completed', recipe: [plasma, print1], records: [done('plasma-1', '10:00'), done('print-1', '10:30')], expected: [] },
    { name: 'a dry lies between treatment and print', recipe: [plasma, dry1, print2], records: [done('plasma-1', '10:00'), done('dry-1', '10:20')], expected: ['plasma-1→print-2'] },
    { name: 'two treatments precede one print', recipe: [wipe, plasma, print1], records: [done('wipe-1', '09:50'), done('plasma-1', '10:00')], expected: ['wipe-1→print-1', 'plasma-1→print-1'] },
    { name: 'the first print is done and a second treatment waits', recipe: [plasma, print1, steps.treatment('plasma-2', { maxWaitBeforePrintMinutes: 60 }), print2], records: [done('plasma-1', '09:00'), done('print-1', '09:30'), done('plasma-2', '10:00')], expected: ['plasma-2→print-2'] },
  ])('when $name, then the waits that matter are $expected', ({ recipe, records, expected }) => {
    const result = treatmentWaitExceeded(recipe, records, null, at('10:45'));
    expect(result.map((w) => `${w.treatmentStepId}→${w.printStepId}`)).toEqual(expected);
  });

  it('when a treatment was done twice, then the wait counts from its latest completion', () => {
    const records = [done('plasma-1', '08:00'), done('plasma-1', '10:30'), { stepId: 'plasma-1', completedAt: null }];
    const [wait] = treatmentWaitExceeded([plasma, print1], records, at('11:00'), at('11:00'));
    expect(wait?.waitedMinutes).toBe(30);
    expect(wait?.isExceeded).toBe(false);
  });
});
