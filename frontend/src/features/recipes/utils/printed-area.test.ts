import { describe, expect, it } from 'vitest';

import { printedFraction } from './printed-area';

const px = (...pixels: [number, number, number, number][]) => new Uint8ClampedArray(pixels.flat());

describe('printedFraction', () => {
  it.each([
    ['when every pixel is transparent, then nothing is printed', px([0, 0, 0, 0], [255, 0, 0, 5]), 0],
    ['when every pixel is white, then nothing is printed', px([255, 255, 255, 255], [252, 251, 250, 255]), 0],
    ['when half the pixels are opaque black, then half is printed', px([0, 0, 0, 255], [0, 0, 0, 0]), 0.5],
    ['when a pixel is coloured but light, then it still counts as ink', px([200, 220, 240, 255], [255, 255, 255, 255], [255, 255, 255, 0], [10, 10, 10, 128]), 0.5],
    ['when there are no pixels, then the fraction is 0', new Uint8ClampedArray(), 0],
  ])('%s', (_name, rgba, expected) => {
    expect(printedFraction(rgba)).toBe(expected);
  });
});
