import { describe, expect, it } from 'vitest';

import { individualsChart } from './control-chart';
import { ProcessInputError } from './process-input-error';
import { expectRelativelyClose } from './test-support';

// REFERENCES §6.1 I-MR worked example (illustrative data, results derived there), tolerance ±0.1 %.
// d₂ = 1.128 and D₄ = 3.267 are standard table values from memory (REFERENCES §6.1).
const LINE_WIDTHS = [52, 55, 51, 54, 53, 56, 52, 50, 54, 53];
const REL = 0.001;

describe('individualsChart: REFERENCES §6.1 worked example', () => {
  const chart = individualsChart(LINE_WIDTHS);

  it.each([
    { output: 'mean', actual: chart.mean, expected: 53 },
    { output: 'movingRangeMean', actual: chart.movingRangeMean, expected: 2.7778 },
    { output: 'sigma', actual: chart.sigma, expected: 2.4626 },
    // REFERENCES §6.1 lists limits with the 2.66 multiplier (3/1.128 = 2.6596); within ±0.1 %
    { output: 'ucl', actual: chart.ucl, expected: 60.389 },
    { output: 'lcl', actual: chart.lcl, expected: 45.611 },
    { output: 'movingRangeUcl', actual: chart.movingRangeUcl, expected: 9.075 },
  ])('when charting the ten line widths, then $output is $expected', ({ actual, expected }) => {
    expectRelativelyClose(actual, expected, REL);
  });

  it('when charting the ten line widths, then the moving ranges are 3, 4, 3, 1, 3, 4, 2, 4, 1 and nothing signals', () => {
    // REFERENCES §6.1: MR list and "out-of-control points: none"
    expect(chart.movingRanges).toEqual([3, 4, 3, 1, 3, 4, 2, 4, 1]);
    expect(chart.signals).toEqual([]);
  });
});

describe('individualsChart: Western Electric run rules', () => {
  // Rules as stated in Montgomery & Runger from the Western Electric handbook 1956 (REFERENCES §6.2),
  // checked on limits frozen at centre 0, σ 1.
  const UNIT = { mean: 0, sigma: 1 };
  const half = (n: number, v = 0.5) => Array.from({ length: n }, () => v);

  it.each([
    {
      name: 'one point above 3σ',
      values: [0, 3.5],
      signals: [{ index: 1, rule: 'beyond-3-sigma' }],
    },
    {
      name: 'one point below −3σ',
      values: [-3.2],
      signals: [{ index: 0, rule: 'beyond-3-sigma' }],
    },
    { name: 'a point exactly on 3σ', values: [3], signals: [] },
    {
      name: 'two of three above 2σ',
      values: [2.5, 0, 2.5],
      signals: [{ index: 2, rule: 'two-of-three-beyond-2-sigma' }],
    },
    { name: 'two beyond 2σ on opposite sides', values: [2.5, -2.5, 0], signals: [] },
    { name: 'two above 2σ four apart', values: [2.5, 0, 0, 2.5], signals: [] },
    {
      name: 'four of five above 1σ',
      values: [1.5, 1.5, 0, 1.5, 1.5],
      signals: [{ index: 4, rule: 'four-of-five-beyond-1-sigma' }],
    },
    { name: 'three of five above 1σ', values: [1.5, 1.5, 0, 0, 1.5, 1.5], signals: [] },
    {
      name: 'four of five below −1σ',
      values: [-1.5, -1.5, -1.5, -1.5],
      signals: [{ index: 3, rule: 'four-of-five-beyond-1-sigma' }],
    },
    {
      name: 'eight above the centre',
      values: half(8),
      signals: [{ index: 7, rule: 'eight-on-one-side' }],
    },
    {
      name: 'eight below the centre',
      values: half(8, -0.5),
      signals: [{ index: 7, rule: 'eight-on-one-side' }],
    },
    { name: 'seven above the centre', values: half(7), signals: [] },
    { name: 'seven above then one on the centre', values: [...half(7), 0], signals: [] },
    {
      name: 'nine above the centre',
      values: half(9),
      signals: [
        { index: 7, rule: 'eight-on-one-side' },
        { index: 8, rule: 'eight-on-one-side' },
      ],
    },
    {
      name: 'a climb past 2σ to beyond 3σ',
      values: [2.5, 2.5, 3.5],
      signals: [
        { index: 1, rule: 'two-of-three-beyond-2-sigma' },
        { index: 2, rule: 'beyond-3-sigma' },
        { index: 2, rule: 'two-of-three-beyond-2-sigma' },
      ],
    },
  ])('when the data show $name, then the signals are $signals', ({ values, signals }) => {
    expect(individualsChart(values, UNIT).signals).toEqual(signals);
  });
});

describe('individualsChart: frozen limits', () => {
  // REFERENCES §6.1 baseline: mean 53, σ̂ 2.4626 → UCL ≈ 60.389, MR̄ 2.7778, MR UCL 9.075
  const BASELINE = { mean: 53, sigma: 2.4626 };

  it('when new points are charted against the §6.1 baseline, then limits come from the baseline and 60.5 signals', () => {
    const chart = individualsChart([53, 60.5, 54], BASELINE);
    expectRelativelyClose(chart.ucl, 60.389, REL);
    expectRelativelyClose(chart.movingRangeMean, 2.7778, REL);
    expectRelativelyClose(chart.movingRangeUcl, 9.075, REL);
    expect(chart.movingRanges).toEqual([7.5, 6.5]);
    expect(chart.signals).toEqual([{ index: 1, rule: 'beyond-3-sigma' }]);
  });

  it('when a single new point is charted against frozen limits, then it is judged and has no moving range', () => {
    const chart = individualsChart([44], BASELINE);
    expect(chart.movingRanges).toEqual([]);
    expect(chart.signals).toEqual([{ index: 0, rule: 'beyond-3-sigma' }]);
  });
});

describe('individualsChart: input errors', () => {
  it.each([
    { name: 'no values', values: [], frozen: undefined, field: 'values' },
    { name: 'one value without frozen limits', values: [5], frozen: undefined, field: 'values' },
    { name: 'a NaN value', values: [1, Number.NaN, 2], frozen: undefined, field: 'values[1]' },
    {
      name: 'a frozen σ of 0',
      values: [1, 2],
      frozen: { mean: 1, sigma: 0 },
      field: 'frozen.sigma',
    },
    {
      name: 'a NaN frozen mean',
      values: [1, 2],
      frozen: { mean: Number.NaN, sigma: 1 },
      field: 'frozen.mean',
    },
  ])('when given $name, then ProcessInputError names $field', ({ values, frozen, field }) => {
    const call = () => individualsChart(values, frozen);
    expect(call).toThrow(ProcessInputError);
    expect(call).toThrow(expect.objectContaining({ field }));
  });

  it('when all values are equal, then σ is 0 and nothing signals', () => {
    // MR̄ = 0 → σ̂ = 0 (REFERENCES §6.1); no point lies off the centre line
    const chart = individualsChart([5, 5, 5, 5, 5, 5, 5, 5, 5]);
    expect([chart.sigma, chart.ucl, chart.lcl, chart.signals.length]).toEqual([0, 5, 5, 0]);
  });
});
