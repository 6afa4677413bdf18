import { describe, expect, it } from 'vitest';

import { hazardStatement } from './ghs-statements';

describe('hazardStatement', () => {
  it.each([
    // CLP Annex I 2.6.3 (flammable liquids, category 2): H225
    ['H225', 'H225 — Highly flammable liquid and vapour'],
    ['h336', 'H336 — May cause drowsiness or dizziness'],
    ['H999', 'H999 — see the safety data sheet'],
  ])('when the code is %s, then the caution reads "%s"', (code, text) => {
    expect(hazardStatement(code)).toBe(text);
  });
});
