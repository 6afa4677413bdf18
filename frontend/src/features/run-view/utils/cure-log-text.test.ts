import { describe, expect, it } from 'vitest';

import { parseCureLog } from './cure-log-text';

describe('parseCureLog', () => {
  it.each([
    ['commas', '0, 25\n10,148.5', [{ minute: 0, tempC: 25 }, { minute: 10, tempC: 148.5 }]],
    ['semicolons with decimal commas', '0;25\n10;148,5', [{ minute: 0, tempC: 25 }, { minute: 10, tempC: 148.5 }]],
    ['tabs from a spreadsheet', '0\t25\r\n5\t120', [{ minute: 0, tempC: 25 }, { minute: 5, tempC: 120 }]],
    ['spaces and blank lines', '0 25\n\n  20   150  ', [{ minute: 0, tempC: 25 }, { minute: 20, tempC: 150 }]],
  ])('when the log is typed with %s, then every line becomes a point', (_case, text, samples) => {
    expect(parseCureLog(text)).toEqual({ samples, problems: [] });
  });

  it('when a line is not "minute, °C", then it is named and left out', () => {
    expect(parseCureLog('0, 25\noven opened\n10, 150, 3')).toEqual({
      samples: [{ minute: 0, tempC: 25 }],
      problems: ['Line 2 ("oven opened") is not "minute, °C".', 'Line 3 ("10, 150, 3") is not "minute, °C".'],
    });
  });
});
