import { describe, expect, it } from 'vitest';

import { heatExposureOf, heatExposures } from './heat-exposure';
import { steps } from './test-fixtures';

// Which steps heat, and for how long at each end, are our rules (ambient 25 °C: common practice, no source).
describe('heatExposureOf', () => {
  // prettier-ignore
  it.each([
    { name: 'a 30 min cure at 150 °C', step: steps.cure('c', { temperatureC: 150, minutes: 30 }), expected: { tempC: 150, longestSeconds: 1800, shortestMinutes: 30, what: 'cure' } },
    { name: 'a 15 s press at 140 °C', step: steps.transfer('t', { temperatureC: 140, seconds: 15 }), expected: { tempC: 140, longestSeconds: 15, shortestMinutes: 0.25, what: 'heat press' } },
    { name: 'a hot-plate dry of 5–10 min at 90 °C', step: steps.dry('d', { method: 'hot-plate', temperatureC: 90 }, { minMinutes: 5, maxMinutes: 10 }), expected: { tempC: 90, longestSeconds: 600, shortestMinutes: 5, what: 'hot plate dry' } },
    { name: 'an oven dry with no shortest time', step: steps.dry('d', { temperatureC: 90 }, { minMinutes: null, maxMinutes: 10 }), expected: { longestSeconds: 600, shortestMinutes: 0 } },
    { name: 'a print on a 60 °C platen', step: steps.print('p', { platenTempC: 60 }), expected: { tempC: 60, what: 'heated platen' } },
    { name: 'a solder attach at 170 °C', step: steps.attach('a', { method: 'low-temp-solder', temperatureC: 170 }), expected: { tempC: 170, what: 'working temperature' } },
  ])('when the step is $name, then it heats as $expected', ({ step, expected }) => {
    expect(heatExposureOf(step, 0)).toMatchObject(expected);
  });

  // prettier-ignore
  it.each([
    { name: 'an air dry at 25 °C', step: steps.dry('d', { method: 'air', temperatureC: 25 }) },
    { name: 'a print with no platen heat', step: steps.print('p') },
    { name: 'z-axis tape with no working temperature', step: steps.attach('a') },
    { name: 'an inspection', step: steps.inspect('i') },
  ])('when the step is $name, then it applies no heat', ({ step }) => {
    expect(heatExposureOf(step, 0)).toBeNull();
  });
});

describe('heatExposures', () => {
  it('when heat and non-heat steps mix, then only the heat steps come back with their positions', () => {
    const found = heatExposures([steps.print('p'), steps.dry('d', { temperatureC: 80 }), steps.inspect('i'), steps.cure('c', { temperatureC: 150 })]);
    expect(found.map((h) => [h.index, h.tempC])).toEqual([[1, 80], [3, 150]]);
  });
});
