import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { LotViewSchema } from '@tracewright/shared';

import { MaterialLotModel } from '../models/material-lot.model';
import { describeCatalogue, uniqueName } from '../../test/catalogue-contract';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let inkId: number;
let substrateId: number;
const post = (path: string, body: object) => engineer.agent.post(path).set('X-CSRF-Token', engineer.csrf).send(body);

// Invented, plausible values: they exercise the API, not any published property.
const makeInk = async (name: string, potLifeHours: number | null = null) =>
  (
    await post('/api/inks', {
      name: uniqueName(name),
      function: 'dielectric',
      viscosityMilliPaS: 14,
      surfaceTensionMilliNPerM: 30,
      densityKgPerM3: 1080,
      solidsWtPercent: 60,
      potLifeHours,
    })
  ).body.id as number;

beforeAll(async () => {
  t = await createTestContext();
  engineer = await signedInUser(t.app, 'engineer');
  inkId = await makeInk('lot ink', 720);
  const substrate = await post('/api/substrates', {
    name: uniqueName('lot film'),
    substrateClass: 'tpu-film',
    thicknessUm: 50,
    maxContinuousTempC: 110,
    maxShortExposureTempC: 150,
    maxShortExposureSeconds: 30,
  });
  substrateId = substrate.body.id;
});
afterAll(() => t.close());

const lotBody = (lotNumber: string) => ({ materialType: 'ink', materialId: inkId, lotNumber, receivedOn: '2026-10-01', expiresOn: '2027-10-01' });

describeCatalogue(() => t, {
  noun: 'lot',
  path: '/api/lots',
  listKey: 'lots',
  entityType: 'lot',
  model: MaterialLotModel,
  outputSchema: LotViewSchema,
  nameField: 'lotNumber',
  validBody: lotBody,
  change: { notes: 'Moved to the flammables cabinet.' },
  badChanges: [
    ['a received date of "NaN"', { receivedOn: 'NaN' }],
    ['a received date that does not exist', { receivedOn: '2026-02-30' }],
    ['an opened date before the received date', { openedOn: '2026-09-01' }],
    ['an unknown material type', { materialType: 'paint' }],
    ['a material id sent as text', { materialId: '7' }],
    ['SQL in the material id', { materialId: '1 OR 1=1' }],
  ],
});

describe('lot material', () => {
  it('when the material does not exist, then 422 names materialId and nothing is written', async () => {
    const lotNumber = uniqueName('orphan');
    const res = await post('/api/lots', { ...lotBody(lotNumber), materialType: 'substrate', materialId: 2147483000 });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/no substrate with id 2147483000/);
    expect(res.body.error.details.fieldErrors.materialId).toHaveLength(1);
    expect(await MaterialLotModel.count({ where: { lotNumber } })).toBe(0);
  });

  it('when the material is archived, then a new lot is refused but a lot already on it can still be corrected', async () => {
    const archivedInk = await makeInk('soon archived');
    const existing = await post('/api/lots', { ...lotBody(uniqueName('kept')), materialId: archivedInk });
    await post(`/api/inks/${archivedInk}/archive`, {});
    const refused = await post('/api/lots', { ...lotBody(uniqueName('new')), materialId: archivedInk });
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toMatch(/archived/);
    const corrected = await engineer.agent
      .put(`/api/lots/${existing.body.id}`)
      .set('X-CSRF-Token', engineer.csrf)
      .send({ ...existing.body, notes: 'Label reprinted.' });
    expect(corrected.status).toBe(200);
  });
});

describe('lot status', () => {
  it('when lots are listed, then each has its material’s name and today’s flags in the lab’s calendar', async () => {
    // Noon UTC is 2 December in every zone from UTC−12 to UTC+11, whatever the lab settings say.
    t.ctx.clock = { now: () => new Date('2026-12-02T12:00:00Z') };
    const batch = uniqueName('status');
    const make = async (suffix: string, body: object) => {
      const res = await post('/api/lots', { ...lotBody(`${batch} ${suffix}`), ...body });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body.id as number;
    };
    const expired = await make('expired', { receivedOn: '2026-01-10', expiresOn: '2026-11-20' });
    // The ink's pot life is 720 h = 30 days: opened 1 October it ran out on 31 October.
    const stale = await make('stale', { openedOn: '2026-10-01' });
    const fresh = await make('fresh', { openedOn: '2026-12-01' });
    const film = await make('film', { materialType: 'substrate', materialId: substrateId, receivedOn: '2025-12-01', openedOn: '2026-01-01' });

    const res = await engineer.agent.get('/api/lots').query({ q: batch });
    const lots = new Map(res.body.lots.map((l: unknown) => LotViewSchema.parse(l)).map((l: { id: number }) => [l.id, l]));
    expect(lots.get(expired)).toMatchObject({ status: { flags: ['expired'], usable: false } });
    expect(lots.get(stale)).toMatchObject({ status: { flags: ['past-pot-life'], usable: false } });
    expect(lots.get(fresh)).toMatchObject({ status: { flags: [], usable: true } });
    // Substrates have no pot life: opening long ago does not flag them.
    expect(lots.get(film)).toMatchObject({ status: { flags: [], usable: true } });
    expect((lots.get(film) as { materialName: string }).materialName).toMatch(/^lot film /);
    expect((await engineer.agent.get(`/api/lots/${expired}`)).body.status.messages).toEqual(['Expired on 2026-11-20.']);
  });
});
