import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { HeatSourceViewSchema, InstrumentViewSchema, SurfaceTreaterViewSchema } from '@tracewright/shared';

import { HeatSourceModel } from '../models/heat-source.model';
import { InstrumentModel } from '../models/instrument.model';
import { SurfaceTreaterModel } from '../models/surface-treater.model';
import { describeCatalogue, uniqueName } from '../../test/catalogue-contract';
import { signedInUser } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(() => t.close());

// Invented, plausible values: they exercise the API, not any published property.
describeCatalogue(() => t, {
  noun: 'heat source',
  path: '/api/heat-sources',
  listKey: 'heatSources',
  entityType: 'heat-source',
  model: HeatSourceModel,
  outputSchema: HeatSourceViewSchema,
  nameField: 'name',
  validBody: (name) => ({ name, kind: 'oven', maxTempC: 250, calibrationDueOn: '2027-06-01' }),
  change: { maxTempC: 230, kind: 'heat-press' },
  badChanges: [
    ['a maximum temperature sent as the text "NaN"', { maxTempC: 'NaN' }],
    ['a maximum temperature below room temperature', { maxTempC: 5 }],
    ['an unknown kind', { kind: 'furnace' }],
    ['a calibration date in month 13', { calibrationDueOn: '2027-13-01' }],
  ],
});

describeCatalogue(() => t, {
  noun: 'surface treater',
  path: '/api/surface-treaters',
  listKey: 'surfaceTreaters',
  entityType: 'surface-treater',
  model: SurfaceTreaterModel,
  outputSchema: SurfaceTreaterViewSchema,
  nameField: 'name',
  validBody: (name) => ({ name, method: 'plasma', calibrationDueOn: null }),
  change: { method: 'corona' },
  badChanges: [
    ['an unknown method', { method: 'laser' }],
    ['a calibration date in words', { calibrationDueOn: 'tomorrow' }],
    ['notes of 5000 characters', { notes: 'n'.repeat(5000) }],
  ],
});

describeCatalogue(() => t, {
  noun: 'instrument',
  path: '/api/instruments',
  listKey: 'instruments',
  entityType: 'instrument',
  model: InstrumentModel,
  outputSchema: InstrumentViewSchema,
  nameField: 'name',
  validBody: (name) => ({ name, kind: 'multimeter', serialNumber: 'MM-0412', calibrationDueOn: '2027-01-15' }),
  change: { serialNumber: 'MM-0413' },
  badChanges: [
    ['an unknown kind', { kind: 'ruler' }],
    ['a number as the serial number', { serialNumber: 42 }],
    ['a calibration date as a number', { calibrationDueOn: 20270115 }],
  ],
});

describe('calibration status', () => {
  it.each([
    // Due-soon window is 14 days (common practice, no source; rules/material-status.ts).
    ['2026-11-01', 'overdue'],
    ['2026-12-10', 'due-soon'],
    ['2027-06-01', 'ok'],
    [null, 'not-tracked'],
  ])('when calibration is due on %s (today 2 December 2026), then the list says %s', async (dueOn, state) => {
    // Noon UTC is 2 December in every zone from UTC−12 to UTC+11, whatever the lab settings say.
    t.ctx.clock = { now: () => new Date('2026-12-02T12:00:00Z') };
    const engineer = await signedInUser(t.app, 'engineer');
    const name = uniqueName('goniometer');
    const created = await engineer.agent
      .post('/api/instruments')
      .set('X-CSRF-Token', engineer.csrf)
      .send({ name, kind: 'contact-angle-goniometer', calibrationDueOn: dueOn });
    expect(created.body.status.state).toBe(state);
    const listed = await engineer.agent.get('/api/instruments').query({ q: name });
    expect(listed.body.instruments[0].status.state).toBe(state);
  });
});
