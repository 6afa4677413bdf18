import { describe, expect, it } from 'vitest';

import { checkSummary, ProcessCheckSchema, type CheckStatus } from './process-check';

const of = (...statuses: CheckStatus[]) => statuses.map((status) => ({ status }));

describe('checkSummary', () => {
  // prettier-ignore
  it.each([
    { name: 'no checks', checks: of(), expected: { pass: 0, warning: 0, blocked: 0, isBlocked: false } },
    { name: 'passes and a warning', checks: of('pass', 'warning', 'pass'), expected: { pass: 2, warning: 1, blocked: 0, isBlocked: false } },
    { name: 'one blocked among passes', checks: of('pass', 'blocked', 'pass'), expected: { pass: 2, warning: 0, blocked: 1, isBlocked: true } },
  ])('when there are $name, then the summary counts them', ({ checks, expected }) => {
    expect(checkSummary(checks)).toEqual(expected);
  });
});

describe('ProcessCheckSchema', () => {
  it.each([
    { name: 'a well-formed check', value: { id: 'heat:c:print-substrate', family: 'heat', stepId: 'c', status: 'pass', title: 't', numbers: '', why: 'w' }, isValid: true },
    { name: 'an unknown family', value: { id: 'x', family: 'colour', stepId: null, status: 'pass', title: 't', numbers: '', why: 'w' }, isValid: false },
    { name: 'an unknown status', value: { id: 'x', family: 'heat', stepId: null, status: 'ok', title: 't', numbers: '', why: 'w' }, isValid: false },
  ])('when it parses $name, then success is $isValid', ({ value, isValid }) => {
    expect(ProcessCheckSchema.safeParse(value).success).toBe(isValid);
  });
});
