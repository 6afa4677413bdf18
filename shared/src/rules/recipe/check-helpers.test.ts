import { describe, expect, it } from 'vitest';

import { ProcessInputError } from '../../process/process-input-error';
import { checkMaker, guarded, stepLabel } from './check-helpers';

const identity = { id: 'wetting:s1', family: 'wetting' as const, stepId: 's1', title: 'Wetting' };

describe('stepLabel', () => {
  it.each([
    { index: 0, title: 'Plasma', expected: 'step 1 “Plasma”' },
    { index: 11, title: 'Cure', expected: 'step 12 “Cure”' },
  ])('when the step is at index $index, then it reads $expected', ({ index, title, expected }) => {
    expect(stepLabel(index, { title })).toBe(expected);
  });
});

describe('guarded', () => {
  it('when the work succeeds, then its checks come back as they are', () => {
    const check = checkMaker('wetting')({ ...identity, status: 'pass', numbers: '', why: 'ok' });
    expect(guarded(identity, () => [check])).toEqual([check]);
  });

  it('when a process input is not physical, then one warning names the problem', () => {
    const result = guarded(identity, () => {
      throw new ProcessInputError('dpi', 'dpi must be above 0; got 0.');
    });
    expect(result).toEqual([{ ...identity, status: 'warning', numbers: '', why: "Can't check this: dpi must be above 0; got 0. Correct the record." }]);
  });

  it('when anything else goes wrong, then the error is not swallowed', () => {
    expect(() =>
      guarded(identity, () => {
        throw new TypeError('bug');
      }),
    ).toThrow(TypeError);
  });
});
