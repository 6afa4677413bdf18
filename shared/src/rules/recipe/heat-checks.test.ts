import { describe, expect, it } from 'vitest';

import { heatStatus } from './heat-checks';
import { checksOf, makeHeatSource, makeInput, makeSetup, makeSubstrate, steps } from './test-fixtures';

// The 10 °C margin and the short-exposure rule are product rules (common practice, no source).
// Limits here are an invented fixture film: continuous 120 °C, short exposure 160 °C for 60 s.
const LIMITS = { maxContinuousTempC: 120, maxShortExposureTempC: 160, maxShortExposureSeconds: 60 };
const film = (id = 1, name = 'Fixture film') => makeSubstrate({ id, name, ...LIMITS });

describe('heatStatus', () => {
  // prettier-ignore
  it.each([
    { tempC: 110, seconds: 1800, status: 'pass', why: 'exactly 10 °C under the continuous limit' },
    { tempC: 110.5, seconds: 1800, status: 'warning', why: 'inside the 10 °C margin' },
    { tempC: 120, seconds: 1800, status: 'warning', why: 'at the continuous limit' },
    { tempC: 150, seconds: 60, status: 'warning', why: 'above continuous, within the short limit for its full 60 s' },
    { tempC: 150, seconds: 61, status: 'blocked', why: 'above continuous for longer than the short exposure' },
    { tempC: 160, seconds: 15, status: 'warning', why: 'at the short-exposure limit, briefly' },
    { tempC: 161, seconds: 5, status: 'blocked', why: 'above the short-exposure limit' },
  ])('when $tempC °C is held $seconds s ($why), then it is $status', ({ tempC, seconds, status }) => {
    expect(heatStatus(tempC, seconds, LIMITS)).toBe(status);
  });
});

describe('heatChecks', () => {
  // prettier-ignore
  it.each([
    { name: 'a 30 min cure at 150 °C', step: steps.cure('s', { temperatureC: 150, minutes: 30 }), status: 'blocked' },
    { name: 'a 15 s press at 150 °C', step: steps.transfer('s', { temperatureC: 150, seconds: 15 }), status: 'warning' },
    { name: 'a dry of up to 10 min at 115 °C', step: steps.dry('s', { temperatureC: 115 }, { minMinutes: 5, maxMinutes: 10 }), status: 'warning' },
    { name: 'a heated platen at 60 °C', step: steps.print('s', { platenTempC: 60 }), status: 'pass' },
    { name: 'a solder iron at 180 °C', step: steps.attach('s', { method: 'low-temp-solder', temperatureC: 180 }), status: 'blocked' },
  ])('when the recipe has $name, then the print substrate check is $status', ({ step, status }) => {
    const [check] = checksOf('heat', makeInput({ substrates: [film()], steps: [step] }));
    expect(check).toMatchObject({ id: 'heat:s:print-substrate', stepId: 's', status });
  });

  it.each([
    { tempC: 25, count: 0 },
    { tempC: 26, count: 1 },
  ])('when a dry runs at $tempC °C, then $count heat check(s) follow (room temperature is 25 °C, common practice)', ({ tempC, count }) => {
    expect(checksOf('heat', makeInput({ substrates: [film()], steps: [steps.dry('d', { temperatureC: tempC })] }))).toHaveLength(count);
  });

  it('when a transfer comes, then it heats both substrates and later steps heat only the receiving one', () => {
    const input = makeInput({
      setup: makeSetup({ receivingSubstrateId: 2 }),
      substrates: [film(1, 'Carrier'), makeSubstrate({ id: 2, name: 'Receiver', maxContinuousTempC: 200, maxShortExposureTempC: 220 })],
      steps: [steps.cure('before', { temperatureC: 100 }), steps.transfer('press', { temperatureC: 150, seconds: 15 }), steps.cure('after', { temperatureC: 150 })],
    });
    const ids = checksOf('heat', input).map((c) => `${c.id}=${c.status}`);
    expect(ids).toEqual([
      'heat:before:print-substrate=pass',
      'heat:press:print-substrate=warning',
      'heat:press:receiving-substrate=pass',
      'heat:after:receiving-substrate=pass',
    ]);
  });

  it.each([
    { maxTempC: 200, status: 'pass' },
    { maxTempC: 149, status: 'blocked' },
  ])('when the oven reaches $maxTempC °C and the cure asks 150 °C, then the heat-source check is $status', ({ maxTempC, status }) => {
    const input = makeInput({ heatSources: [makeHeatSource({ maxTempC })], steps: [steps.cure('c', { temperatureC: 150, heatSourceId: 1 })] });
    expect(checksOf('heat', input).find((c) => c.id === 'heat:c:heat-source')?.status).toBe(status);
  });

  it('when the step lasts longer than the short exposure, then the reason gives both times', () => {
    const [check] = checksOf('heat', makeInput({ substrates: [film()], steps: [steps.cure('c', { temperatureC: 150, minutes: 30 })] }));
    expect(check?.why).toContain('30 min is longer than the 160 °C for 60 s');
  });
});
