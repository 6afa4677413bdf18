import { describe, expect, it } from 'vitest';

import { changeLabel, changeValue } from './change-words';

describe('change words', () => {
  it.each([
    ['params.temperatureC', 'Temperature'],
    ['title', 'Title'],
    ['readingSpecs[r-trace].upperLimit', 'Readings r-trace: upperLimit'],
    ['channelPlan[C1].inkId', 'Channel plan C1: Ink'],
    ['readingSpecs#order', 'Readings order'],
  ])('when the path is %s, then it reads “%s”', (path, words) => {
    expect(changeLabel(path)).toBe(words);
  });

  it.each([
    [null, '—'],
    [150, '150'],
    [true, 'yes'],
    ['cold', '“cold”'],
    [[1, 2], '[1,2]'],
  ])('when the value is %j, then it shows as %s', (value, shown) => {
    expect(changeValue(value)).toBe(shown);
  });
});
