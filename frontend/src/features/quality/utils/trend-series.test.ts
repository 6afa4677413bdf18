import { describe, expect, it } from 'vitest';

import { aTrend } from '../testing/trend-fixtures';
import { individualsPoints, movingRangePoints, signalPositions } from './trend-series';

describe('trend series', () => {
  it('when a point before a signal is excluded, then the signal (counted over included points) moves to the next point', () => {
    const trend = aTrend();
    trend.points[3] = { ...trend.points[3]!, excluded: true };

    expect([...signalPositions(trend).entries()]).toEqual([[11, ['two-of-three-beyond-2-sigma']]]);
    expect(individualsPoints(trend).filter((p) => p.isSignal).map((p) => p.x)).toEqual([12]);
    expect(individualsPoints(trend)[3]).toMatchObject({ x: 4, isExcluded: true });
  });

  it('when moving ranges are drawn, then they join consecutive included points only, placed at the later one', () => {
    const trend = aTrend({ chart: null });
    trend.points = trend.points.slice(0, 4).map((p, i) => ({ ...p, value: [10, 11, 50, 10.5][i]!, excluded: i === 2 }));

    expect(movingRangePoints(trend).map((p) => [p.x, Number(p.y.toFixed(2))])).toEqual([
      [2, 1],
      [4, 0.5],
    ]);
  });
});
