import { describe, expect, it } from 'vitest';

import type { RunState } from '../../schemas/run.schema';
import type { DeviationState } from './deviation-transitions';
import { runSignOffCheck } from './run-sign-off';

const deviation = (id: number, state: DeviationState) => ({ id, title: `Deviation ${id}`, state });

describe('runSignOffCheck', () => {
  it.each([
    { name: 'a completed run without deviations', state: 'completed', states: [], can: true },
    { name: 'a completed run whose deviations are dispositioned or closed', state: 'completed', states: ['dispositioned', 'closed'], can: true },
    { name: 'a completed run with an open deviation', state: 'completed', states: ['dispositioned', 'open'], can: false },
    { name: 'a completed run with a deviation in review', state: 'completed', states: ['in-review'], can: false },
    { name: 'a run still in progress', state: 'in-progress', states: [], can: false },
    { name: 'a cancelled run', state: 'cancelled', states: [], can: false },
    { name: 'a run already signed off', state: 'closed', states: [], can: false },
  ] as const)('when it is $name, then canSignOff is $can', ({ state, states, can }) => {
    const check = runSignOffCheck({ code: 'R-2026-0007', state: state as RunState }, states.map((s, i) => deviation(i + 1, s)));
    expect(check.canSignOff).toBe(can);
    expect(check.refusal === null).toBe(can);
  });

  it('when two deviations are undecided, then the refusal names both with their states', () => {
    const check = runSignOffCheck({ code: 'R-2026-0007', state: 'completed' }, [deviation(3, 'open'), deviation(4, 'closed'), deviation(5, 'in-review')]);
    expect(check.undecided.map((d) => d.id)).toEqual([3, 5]);
    expect(check.refusal).toBe('Run R-2026-0007 cannot be signed off: 2 deviations have no disposition yet (#3 “Deviation 3” is open; #5 “Deviation 5” is in review).');
  });
});
