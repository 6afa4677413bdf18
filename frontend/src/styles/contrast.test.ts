import { readFileSync } from 'node:fs';
import { join } from 'node:path';

import { describe, expect, it } from 'vitest';

// Reads the tokens from index.css itself, so a colour change that breaks contrast fails here.
// (Read from disk: the test runner stubs CSS imports, `?raw` included.)
const css = readFileSync(join(import.meta.dirname, '../index.css'), 'utf8');
const token = (name: string): string => {
  const match = new RegExp(`--color-${name}:\\s*(#[0-9a-f]{6})`, 'i').exec(css);
  if (!match?.[1]) throw new Error(`Token --color-${name} is missing from index.css`);
  return match[1];
};

/** WCAG 2.x relative luminance of an sRGB colour. */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

// [foreground, background, minimum]: 4.5 for text, 3 for borders, focus rings and large text.
const PAIRS: [string, string, number][] = [
  ['graphite-900', 'paper', 4.5],
  ['graphite-700', 'paper', 4.5],
  ['graphite-600', 'paper', 4.5],
  ['graphite-600', 'white', 4.5],
  ['graphite-600', 'graphite-50', 4.5],
  ['graphite-700', 'graphite-100', 4.5],
  ['graphite-800', 'graphite-100', 4.5],
  ['white', 'copper-600', 4.5],
  ['white', 'copper-700', 4.5],
  ['white', 'oxide-700', 4.5],
  ['copper-700', 'paper', 4.5],
  ['copper-700', 'white', 4.5],
  ['copper-700', 'copper-50', 4.5],
  ['verdigris-800', 'verdigris-50', 4.5],
  ['amber-800', 'amber-50', 4.5],
  ['oxide-800', 'oxide-50', 4.5],
  ['oxide-700', 'white', 4.5],
  ['oxide-700', 'paper', 4.5],
  ['graphite-500', 'paper', 3],
  ['graphite-500', 'white', 3],
  ['copper-600', 'paper', 3],
  ['copper-600', 'white', 3],
  ['oxide-700', 'oxide-50', 3],
];

describe('colour tokens', () => {
  it.each(PAIRS)('when %s sits on %s, then the contrast is at least %d:1', (fg, bg, minimum) => {
    expect(contrast(token(fg), token(bg))).toBeGreaterThanOrEqual(minimum);
  });
});
