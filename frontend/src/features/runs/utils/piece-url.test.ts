import { describe, expect, it } from 'vitest';

import { pieceUrl } from './piece-url';

describe('pieceUrl', () => {
  it.each([
    ['https://lab.example/run/42', 'R-2026-0042-03', 'https://lab.example/run/42?piece=R-2026-0042-03'],
    ['https://lab.example/bench/run/7?from=qr', 'R-2026-0007-01', 'https://lab.example/bench/run/7?from=qr&piece=R-2026-0007-01'],
    ['https://lab.example/run/8', 'A B&C', 'https://lab.example/run/8?piece=A+B%26C'],
  ])('when the run address is %s and the piece %s, then the label address is %s', (url, code, expected) => {
    expect(pieceUrl(url, code)).toBe(expected);
  });
});
