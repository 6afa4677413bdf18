import { describe, expect, it } from 'vitest';

import { DEVIATION_STATES } from '../../schemas/run.schema';
import { canActOnDeviation, DEVIATION_ACTIONS, deviationActionRefusal, deviationStateAfter, type DeviationAction, type DeviationState } from './deviation-transitions';

// Product rule (ours): open → in review → dispositioned → closed; closed takes nothing more.
const ALLOWED: Record<DeviationState, readonly DeviationAction[]> = {
  open: ['assign', 'change-severity', 'comment', 'disposition'],
  'in-review': ['assign', 'change-severity', 'comment', 'disposition'],
  dispositioned: ['comment', 'close'],
  closed: [],
};

const cases = DEVIATION_STATES.flatMap((state) => DEVIATION_ACTIONS.map((action) => ({ state, action, allowed: ALLOWED[state].includes(action) })));

describe('canActOnDeviation', () => {
  it.each(cases)('when a deviation is $state and someone tries to $action, then allowed is $allowed', ({ state, action, allowed }) => {
    expect(canActOnDeviation(state, action)).toBe(allowed);
    expect(deviationActionRefusal(state, action, 5) === null).toBe(allowed);
  });
});

describe('deviationActionRefusal', () => {
  it.each([
    { state: 'closed', action: 'comment', words: 'Deviation 5 is closed, and a closed deviation is a final record, so it cannot be commented on.' },
    { state: 'open', action: 'close', words: 'Deviation 5 is still open: disposition it first, so it cannot be closed.' },
    { state: 'dispositioned', action: 'disposition', words: 'Deviation 5 is already dispositioned; what is left is to verify and close it, so it cannot be dispositioned.' },
  ] as const)('when a $state deviation is asked to $action, then the refusal says why', ({ state, action, words }) => {
    expect(deviationActionRefusal(state, action, 5)).toBe(words);
  });
});

describe('deviationStateAfter', () => {
  it.each([
    { state: 'open', action: 'assign', options: {}, after: 'in-review' },
    { state: 'in-review', action: 'assign', options: {}, after: 'in-review' },
    { state: 'open', action: 'comment', options: {}, after: 'open' },
    { state: 'in-review', action: 'change-severity', options: {}, after: 'in-review' },
    { state: 'open', action: 'disposition', options: {}, after: 'dispositioned' },
    { state: 'in-review', action: 'disposition', options: { isFullyDispositioned: true }, after: 'dispositioned' },
    { state: 'open', action: 'disposition', options: { isFullyDispositioned: false }, after: 'in-review' },
    { state: 'dispositioned', action: 'close', options: {}, after: 'closed' },
  ] as const)('when a $state deviation is given $action $options, then it becomes $after', ({ state, action, options, after }) => {
    expect(deviationStateAfter(state, action, options)).toBe(after);
  });

  it('when an action is not allowed in the state, then asking for the next state throws', () => {
    expect(() => deviationStateAfter('closed', 'assign')).toThrow(RangeError);
  });
});
