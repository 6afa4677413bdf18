import { describe, expect, it } from 'vitest';

import {
  optionalCelsiusThreshold,
  requireCelsius,
  requireContactAngleDeg,
  requireFinite,
  requireInRange,
  requireMinLength,
  requireNonNegative,
  requirePositive,
} from './input-guards';
import { ProcessInputError } from './process-input-error';

describe('input guards accept physical values', () => {
  it.each([
    { name: 'finite 0', call: () => requireFinite('x', 0), expected: 0 },
    { name: 'positive', call: () => requirePositive('x', 1e-9), expected: 1e-9 },
    { name: 'non-negative 0', call: () => requireNonNegative('x', 0), expected: 0 },
    { name: 'range bound', call: () => requireInRange('x', 100, 0, 100), expected: 100 },
    { name: 'angle 0° (closed range)', call: () => requireContactAngleDeg('x', 0), expected: 0 },
    {
      name: 'angle 180° (closed range)',
      call: () => requireContactAngleDeg('x', 180),
      expected: 180,
    },
    {
      name: 'angle 179.9° (open range)',
      call: () => requireContactAngleDeg('x', 179.9, true),
      expected: 179.9,
    },
    { name: 'cold but above absolute zero', call: () => requireCelsius('x', -273), expected: -273 },
    {
      name: 'no threshold',
      call: () => optionalCelsiusThreshold('x', undefined),
      expected: Number.NEGATIVE_INFINITY,
    },
  ])('when given $name, then the value passes through', ({ call, expected }) => {
    expect(call()).toBe(expected);
  });
});

describe('input guards reject non-physical values', () => {
  it.each([
    { name: 'NaN', call: () => requireFinite('viscosityMilliPaS', Number.NaN) },
    { name: 'Infinity', call: () => requireFinite('viscosityMilliPaS', Number.POSITIVE_INFINITY) },
    { name: 'a string', call: () => requireFinite('viscosityMilliPaS', '5' as unknown as number) },
    { name: 'zero where positive is needed', call: () => requirePositive('viscosityMilliPaS', 0) },
    { name: 'a negative', call: () => requireNonNegative('viscosityMilliPaS', -0.1) },
    { name: 'above a range', call: () => requireInRange('viscosityMilliPaS', 101, 0, 100) },
    { name: 'an angle above 180°', call: () => requireContactAngleDeg('viscosityMilliPaS', 180.1) },
    { name: 'a negative angle', call: () => requireContactAngleDeg('viscosityMilliPaS', -0.1) },
    {
      name: 'an angle of 0° in the open range',
      call: () => requireContactAngleDeg('viscosityMilliPaS', 0, true),
    },
    { name: 'absolute zero', call: () => requireCelsius('viscosityMilliPaS', -273.15) },
    { name: 'an empty array', call: () => requireMinLength('viscosityMilliPaS', [], 1) },
    {
      name: 'no array',
      call: () => requireMinLength('viscosityMilliPaS', undefined as unknown as number[], 1),
    },
  ])('when given $name, then ProcessInputError names the field', ({ call }) => {
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(
      expect.objectContaining({ field: 'viscosityMilliPaS', name: 'ProcessInputError' }),
    );
  });

  it('when a negative viscosity is given, then the message says what is wrong and what was received', () => {
    expect(() => requirePositive('viscosityMilliPaS', -1)).toThrow(
      'Viscosity (mPa·s) must be above 0; got -1.',
    );
  });

  it('when the error is caught, then it is an Error and a ProcessInputError', () => {
    try {
      requireContactAngleDeg('waterAngleDeg', 200);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(Error);
      expect(error).toBeInstanceOf(ProcessInputError);
      expect((error as ProcessInputError).message).toBe(
        'Water angle (°) must be between 0° and 180°; got 200°.',
      );
    }
  });
});
