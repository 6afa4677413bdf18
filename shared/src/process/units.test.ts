import { describe, expect, it } from 'vitest';

import { celsiusToKelvin, degreesToRadians, formatNumber, radiansToDegrees } from './units';

describe('unit conversions', () => {
  it.each([
    // REFERENCES constants: 0 °C = 273.15 K
    { celsius: 0, kelvin: 273.15 },
    { celsius: 150, kelvin: 423.15 },
    { celsius: -273.15, kelvin: 0 },
  ])('when $celsius °C is converted, then it is $kelvin K', ({ celsius, kelvin }) => {
    expect(celsiusToKelvin(celsius)).toBeCloseTo(kelvin, 12);
  });

  it.each([
    // Definition: 180° = π rad
    { degrees: 180, radians: Math.PI },
    { degrees: 90, radians: Math.PI / 2 },
    { degrees: 0, radians: 0 },
  ])('when $degrees° is converted, then it is $radians rad and back', ({ degrees, radians }) => {
    expect(degreesToRadians(degrees)).toBeCloseTo(radians, 12);
    expect(radiansToDegrees(radians)).toBeCloseTo(degrees, 12);
  });
});

describe('formatNumber', () => {
  it.each([
    // Three significant figures for the reasons, e.g. Z = 6.782 (REFERENCES §1.4) reads "6.78"
    { value: 6.782, text: '6.78' },
    { value: 38.97, text: '39' },
    { value: 0.02566, text: '0.0257' },
    { value: 336.09, text: '336' },
    { value: 1234.6, text: '1235' },
    { value: -2.077, text: '-2.08' },
    { value: 4, text: '4' },
    { value: Number.NaN, text: 'NaN' },
  ])('when $value is formatted, then it reads "$text"', ({ value, text }) => {
    expect(formatNumber(value)).toBe(text);
  });
});
