import { describe, expect, it } from 'vitest';

import { scanTarget } from './scan-target';

const ORIGIN = 'https://tracewright.lab.example';

describe('scanTarget', () => {
  it.each([
    ['a link into this app', `${ORIGIN}/run/7?step=cure-1`, { type: 'path', path: '/run/7?step=cure-1' }],
    ['a traveller printed under another address of the lab', 'http://192.168.4.20:8080/run/12', { type: 'path', path: '/run/12' }],
    ['a path', '/run/scan', { type: 'path', path: '/run/scan' }],
    ['a run code in lower case', 'r-2026-0007', { type: 'run-code', code: 'R-2026-0007' }],
    ['a run number', '42', { type: 'path', path: '/run/42' }],
  ])('when the code is %s, then it leads there', (_case, text, expected) => {
    expect(scanTarget(text, ORIGIN)).toEqual(expected);
  });

  it.each([
    ['another site', 'https://elsewhere.example/people'],
    ['a protocol-relative link', '//elsewhere.example/run/7'],
    ['script', 'javascript:alert(1)'],
    ['plain words', 'LOT-2026-113'],
  ])('when the code is %s, then it is not followed', (_case, text) => {
    expect(scanTarget(text, ORIGIN).type).toBe('unknown');
  });
});
