import { describe, expect, it } from 'vitest';

import type { Role, RunState } from '@tracewright/shared';

import { availableRunActions } from './run-actions';

describe('availableRunActions', () => {
  it.each<[RunState, Role, string[]]>([
    ['planned', 'engineer', ['hold', 'cancel']],
    ['in-progress', 'operator', []],
    ['in-progress', 'quality', ['hold', 'cancel']],
    ['on-hold', 'admin', ['resume', 'cancel']],
    ['on-hold', 'operator', []],
    ['completed', 'quality', []],
    ['cancelled', 'admin', []],
  ])('when a run is %s and the person is %s, then the offered actions are %j', (state, role, expected) => {
    expect(availableRunActions(state, role)).toEqual(expected);
  });
});
