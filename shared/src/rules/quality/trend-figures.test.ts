import { describe, expect, it } from 'vitest';

import { capability } from '../../process/capability';
import { individualsChart } from '../../process/control-chart';
import { ProcessInputError } from '../../process/process-input-error';
import { baselineLimits, judgedValue, latestPointNotes, selectTrendReadings, trendFigures } from './trend-figures';

// REFERENCES §6.1 I-MR worked example (illustrative data, derived results, ±0.1 %).
const WIDTHS = [52, 55, 51, 54, 53, 56, 52, 50, 54, 53];
const REL = 0.001;
const close = (actual: number | null | undefined, expected: number) => expect(Math.abs((actual ?? NaN) - expected) / expected).toBeLessThan(REL);

describe('trendFigures: REFERENCES §6.1 worked example', () => {
  const figures = trendFigures(WIDTHS, { lowerLimit: 44, upperLimit: 60 }, null);

  it.each([
    { output: 'chart.mean', actual: figures.chart?.mean, expected: 53 },
    { output: 'chart.ucl', actual: figures.chart?.ucl, expected: 60.389 },
    { output: 'chart.lcl', actual: figures.chart?.lcl, expected: 45.611 },
    { output: 'chart.movingRangeMean', actual: figures.chart?.movingRangeMean, expected: 2.7778 },
    { output: 'capability.cp', actual: figures.capability?.cp, expected: 1.0829 },
    { output: 'capability.cpk', actual: figures.capability?.cpk, expected: 0.9475 },
  ])('when the ten widths are charted against 44–60, then $output is $expected', ({ actual, expected }) => {
    close(actual, expected);
  });

  it('when the ten widths are charted, then the figures are the process library’s own, provisional below 20 points, with no note', () => {
    const { movingRanges: _r, sigma: _s, ...chart } = individualsChart(WIDTHS);
    expect(figures.chart).toEqual(chart);
    expect(figures.capability).toEqual(capability(WIDTHS, { lsl: 44, usl: 60 }));
    expect(figures.isProvisional).toBe(true);
    expect(figures.note).toBeNull();
  });
});

describe('trendFigures: edges', () => {
  it.each([
    { name: 'no points', values: [], limits: { lowerLimit: 44, upperLimit: 60 }, frozen: null, chart: false, cap: false, note: /at least 2 included points/ },
    { name: 'one point', values: [53], limits: { lowerLimit: 44, upperLimit: 60 }, frozen: null, chart: false, cap: false, note: /at least 2/ },
    { name: 'one point with frozen limits', values: [53], limits: { lowerLimit: 44, upperLimit: 60 }, frozen: { mean: 53, sigma: 2 }, chart: true, cap: false, note: /Capability needs/ },
    { name: 'a spec without limits', values: WIDTHS, limits: { lowerLimit: null, upperLimit: null }, frozen: null, chart: true, cap: false, note: /no limits/ },
    { name: 'values that do not vary', values: [5, 5, 5], limits: { lowerLimit: 4, upperLimit: 6 }, frozen: null, chart: true, cap: false, note: /do not vary/ },
    { name: 'an upper limit only', values: WIDTHS, limits: { lowerLimit: null, upperLimit: 60 }, frozen: null, chart: true, cap: true, note: null },
  ])('when the trend has $name, then chart is $chart and capability is $cap', ({ values, limits, frozen, chart, cap, note }) => {
    const figures = trendFigures(values, limits, frozen);
    expect(figures.chart !== null).toBe(chart);
    expect(figures.capability !== null).toBe(cap);
    if (note === null) expect(figures.note).toBeNull();
    else expect(figures.note).toMatch(note);
  });

  it('when limits are frozen, then the chart is centred on them, not on the values', () => {
    const figures = trendFigures(WIDTHS, { lowerLimit: 44, upperLimit: 60 }, { mean: 50, sigma: 1 });
    expect(figures.chart).toMatchObject({ mean: 50, ucl: 53, lcl: 47 });
    expect(figures.chart?.signals.length).toBeGreaterThan(0);
  });

  it('when there are 20 included points, then the figures are no longer provisional', () => {
    expect(trendFigures([...WIDTHS, ...WIDTHS], { lowerLimit: 44, upperLimit: 60 }, null).isProvisional).toBe(false);
  });
});

describe('selectTrendReadings, judgedValue and latestPointNotes', () => {
  const at = (minute: number) => new Date(Date.UTC(2026, 11, 1, 9, minute));
  it('when readings were corrected and taken out of order, then only standing ones remain, oldest first, ties by id', () => {
    const readings = [
      { id: 5, value: 3, correctedValue: null, supersededById: null, recordedAt: at(10) },
      { id: 2, value: 9, correctedValue: null, supersededById: 5, recordedAt: at(1) },
      { id: 4, value: 2, correctedValue: null, supersededById: null, recordedAt: at(2) },
      { id: 3, value: 1, correctedValue: null, supersededById: null, recordedAt: at(2) },
    ];
    expect(selectTrendReadings(readings).map((r) => r.id)).toEqual([3, 4, 5]);
  });

  it.each([
    { value: 11.9, correctedValue: 11.56, judged: 11.56 },
    { value: 11.9, correctedValue: null, judged: 11.9 },
  ])('when read $value corrected to $correctedValue, then the trend plots $judged', ({ value, correctedValue, judged }) => {
    expect(judgedValue({ value, correctedValue })).toBe(judged);
  });

  it('when a point was excluded and later taken back, then the newer note is in force', () => {
    const notes = [
      { id: 3, readingId: 7, excluded: false, reason: 'Meter was fine after all' },
      { id: 1, readingId: 7, excluded: true, reason: 'Meter suspect' },
      { id: 2, readingId: 8, excluded: true, reason: 'Dropped piece' },
    ];
    const latest = latestPointNotes(notes);
    expect([latest.get(7)?.excluded, latest.get(8)?.excluded, latest.has(9)]).toEqual([false, true, false]);
  });
});

describe('baselineLimits', () => {
  it('when the baseline is the ten widths, then its limits are their mean and moving-range σ (REFERENCES §6.1)', () => {
    const limits = baselineLimits(WIDTHS);
    close(limits.mean, 53);
    close(limits.sigma, 2.4626);
  });

  it.each([
    { name: 'one value', values: [53] },
    { name: 'values that do not vary', values: [4, 4, 4] },
  ])('when the baseline has $name, then it is refused for the baseline field', ({ values }) => {
    expect(() => baselineLimits(values)).toThrow(ProcessInputError);
  });
});
