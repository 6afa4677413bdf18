import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { PrinterSchema } from '@tracewright/shared';

import { PrinterChannelModel } from '../models/printer-channel.model';
import { PrinterModel } from '../models/printer.model';
import { describeCatalogue, uniqueName } from '../../test/catalogue-contract';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let inkId: number;
const post = (path: string, body: object) => engineer.agent.post(path).set('X-CSRF-Token', engineer.csrf).send(body);
const put = (path: string, body: object) => engineer.agent.put(path).set('X-CSRF-Token', engineer.csrf).send(body);

// Invented, plausible values: they exercise the API, not any published property.
const makeInk = async (name: string) =>
  (
    await post('/api/inks', {
      name: uniqueName(name),
      function: 'graphic',
      viscosityMilliPaS: 5,
      surfaceTensionMilliNPerM: 29,
      densityKgPerM3: 1040,
      solidsWtPercent: 8,
    })
  ).body.id as number;

beforeAll(async () => {
  t = await createTestContext();
  engineer = await signedInUser(t.app, 'engineer');
  inkId = await makeInk('channel ink');
});
afterAll(() => t.close());

const printerBody = (name: string) => ({
  name,
  model: 'Bench piezo unit',
  nozzleDiameterUm: 21,
  dropVolumePl: 10,
  jettingSpeedMetresPerSecond: 6,
  nativeDpi: 1270,
  channels: [{ name: 'C1', inkId }, { name: 'C2' }],
});

describeCatalogue(() => t, {
  noun: 'printer',
  path: '/api/printers',
  listKey: 'printers',
  entityType: 'printer',
  model: PrinterModel,
  outputSchema: PrinterSchema,
  nameField: 'name',
  validBody: printerBody,
  change: { nozzleDiameterUm: 50 },
  badChanges: [
    ['a nozzle diameter sent as the text "NaN"', { nozzleDiameterUm: 'NaN' }],
    ['a nozzle diameter of 0', { nozzleDiameterUm: 0 }],
    ['SQL in a number field', { nativeDpi: '1270; DELETE FROM printers' }],
    ['no channels', { channels: [] }],
    ['two channels with the same name', { channels: [{ name: 'C1' }, { name: 'c1' }] }],
    ['an ink id sent as text', { channels: [{ name: 'C1', inkId: 'silver' }] }],
    ['seventeen channels', { channels: Array.from({ length: 17 }, (_, i) => ({ name: `C${i}` })) }],
  ],
});

describe('printer channels', () => {
  it('when a channel names an ink that does not exist, then 422 names the channel and nothing is written', async () => {
    const name = uniqueName('printer');
    const res = await post('/api/printers', { ...printerBody(name), channels: [{ name: 'Silver', inkId: 2147483000 }] });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/Channel Silver: there is no ink with id 2147483000/);
    expect(res.body.error.details.fieldErrors.channels).toHaveLength(1);
    expect(await PrinterModel.count({ where: { name } })).toBe(0);
  });

  it('when channels are reordered and one removed, then the saved list is exactly the new one', async () => {
    const created = await post('/api/printers', { ...printerBody(uniqueName('printer')), channels: [{ name: 'A', inkId }, { name: 'B' }, { name: 'C' }] });
    const res = await put(`/api/printers/${created.body.id}`, { ...created.body, channels: [{ name: 'C' }, { name: 'A', inkId }] });
    expect(res.body.channels).toEqual([{ name: 'C', inkId: null }, { name: 'A', inkId }]);
    expect(await PrinterChannelModel.count({ where: { printerId: created.body.id } })).toBe(2);
  });

  it('when a loaded ink is archived later, then the printer can still be saved, but an archived ink cannot be newly loaded', async () => {
    const laterArchived = await makeInk('later archived');
    const created = await post('/api/printers', { ...printerBody(uniqueName('printer')), channels: [{ name: 'A', inkId: laterArchived }, { name: 'B' }] });
    await post(`/api/inks/${laterArchived}/archive`, {});
    const kept = await put(`/api/printers/${created.body.id}`, { ...created.body, notes: 'Head flushed.' });
    expect(kept.status).toBe(200);
    const loadedNew = await put(`/api/printers/${created.body.id}`, { ...kept.body, channels: [{ name: 'A', inkId: laterArchived }, { name: 'B', inkId: laterArchived }] });
    expect(loadedNew.status).toBe(200);
    const other = await post('/api/printers', { ...printerBody(uniqueName('printer')), channels: [{ name: 'A', inkId: laterArchived }] });
    expect(other.status).toBe(422);
    expect(other.body.error.message).toMatch(/archived/);
  });
});
