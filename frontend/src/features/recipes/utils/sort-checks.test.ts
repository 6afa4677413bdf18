import { describe, expect, it } from 'vitest';

import type { ProcessCheck } from '@tracewright/shared';

import { sortChecks } from './sort-checks';

const check = (id: string, status: ProcessCheck['status']): ProcessCheck => ({ id, family: 'heat', stepId: null, status, title: id, numbers: '', why: '' });

describe('sortChecks', () => {
  it('when checks of every status are mixed, then Blocked come first, then Warning, then Pass, each in the rules’ order', () => {
    const sorted = sortChecks([check('p1', 'pass'), check('w1', 'warning'), check('b1', 'blocked'), check('p2', 'pass'), check('b2', 'blocked')]);
    expect(sorted.map((c) => c.id)).toEqual(['b1', 'b2', 'w1', 'p1', 'p2']);
  });
});
