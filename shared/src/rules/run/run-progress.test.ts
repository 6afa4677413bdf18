import { describe, expect, it } from 'vitest';

import { RUN_STATES, type RunState } from '../../schemas/run.schema';
import { allowedRunTransitions, canTransition, pieceCodes, runCode, runProgress, type StepRecordState } from './run-progress';

const recipe = ['a', 'b', 'c', 'd'].map((id) => ({ id }));
const records = (states: Partial<Record<string, StepRecordState>>) =>
  Object.entries(states).flatMap(([stepId, state]) => (state ? [{ stepId, state }] : []));

describe('runProgress', () => {
  // prettier-ignore
  it.each([
    { name: 'nothing has started', states: {}, current: 'a', next: 'b', done: 0, notDone: 0, complete: false },
    { name: 'a is done and b is in progress', states: { a: 'done', b: 'in-progress' }, current: 'b', next: 'c', done: 1, notDone: 0, complete: false },
    { name: 'a is done and b not done', states: { a: 'done', b: 'not-done' }, current: 'c', next: 'd', done: 1, notDone: 1, complete: false },
    { name: 'c was started before b', states: { a: 'done', c: 'in-progress' }, current: 'c', next: 'd', done: 1, notDone: 0, complete: false },
    { name: 'only the last step is left', states: { a: 'done', b: 'done', c: 'done' }, current: 'd', next: null, done: 3, notDone: 0, complete: false },
    { name: 'every step is settled', states: { a: 'done', b: 'not-done', c: 'done', d: 'done' }, current: null, next: null, done: 3, notDone: 1, complete: true },
    { name: 'a record names a step not in the recipe', states: { zz: 'done' }, current: 'a', next: 'b', done: 0, notDone: 0, complete: false },
  ] as const)('when $name, then current is $current and next is $next', ({ states, current, next, done, notDone, complete }) => {
    expect(runProgress(recipe, records(states))).toEqual({ currentStepId: current, nextStepId: next, doneCount: done, notDoneCount: notDone, total: 4, isComplete: complete });
  });

  it('when a recipe has no steps, then the run is complete', () => {
    expect(runProgress([], []).isComplete).toBe(true);
  });
});

describe('runCode and pieceCodes', () => {
  it.each([
    { year: 2026, sequence: 7, code: 'R-2026-0007' },
    { year: 2026, sequence: 1234, code: 'R-2026-1234' },
    { year: 2027, sequence: 12345, code: 'R-2027-12345' },
  ])('when the year is $year and the sequence $sequence, then the code is $code', ({ year, sequence, code }) => {
    expect(runCode(year, sequence)).toBe(code);
  });

  it.each([
    { quantity: 1, first: 'R-2026-0007-01', last: 'R-2026-0007-01' },
    { quantity: 9, first: 'R-2026-0007-01', last: 'R-2026-0007-09' },
    { quantity: 99, first: 'R-2026-0007-01', last: 'R-2026-0007-99' },
    { quantity: 100, first: 'R-2026-0007-001', last: 'R-2026-0007-100' },
    { quantity: 500, first: 'R-2026-0007-001', last: 'R-2026-0007-500' },
  ])('when the run makes $quantity pieces, then the codes run $first … $last', ({ quantity, first, last }) => {
    const codes = pieceCodes('R-2026-0007', quantity);
    expect(codes).toHaveLength(quantity);
    expect([codes[0], codes.at(-1)]).toEqual([first, last]);
    expect([...codes].sort()).toEqual(codes);
  });

  it.each([
    { name: 'a quantity of 0', call: () => pieceCodes('R-2026-0007', 0) },
    { name: 'a fractional quantity', call: () => pieceCodes('R-2026-0007', 2.5) },
    { name: 'a sequence of 0', call: () => runCode(2026, 0) },
  ])('when given $name, then it is refused', ({ call }) => {
    expect(call).toThrow(RangeError);
  });
});

describe('run transitions', () => {
  const ALLOWED: Record<RunState, RunState[]> = {
    planned: ['in-progress', 'on-hold', 'cancelled'],
    'in-progress': ['on-hold', 'completed', 'cancelled'],
    'on-hold': ['in-progress', 'cancelled'],
    completed: ['closed'],
    closed: [],
    cancelled: [],
  };
  const pairs = RUN_STATES.flatMap((from) => RUN_STATES.map((to) => ({ from, to, allowed: ALLOWED[from].includes(to) })));

  it.each(pairs)('when a run moves from $from to $to, then allowed is $allowed', ({ from, to, allowed }) => {
    expect(canTransition(from, to)).toBe(allowed);
  });

  it.each(RUN_STATES.map((from) => ({ from })))('when a run is $from, then the allowed moves are listed in order', ({ from }) => {
    expect(allowedRunTransitions(from)).toEqual(ALLOWED[from]);
  });
});
