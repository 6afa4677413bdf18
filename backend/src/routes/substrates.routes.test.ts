import { describe, expect, it } from 'vitest';

import { SubstrateSchema, SubstrateWettingSchema } from '@tracewright/shared';

import { SubstrateModel } from '../models/substrate.model';
import { setUpCatalogueLab } from '../../test/catalogue-lab';
import { describeCatalogue, uniqueName } from '../../test/catalogue-contract';

const lab = setUpCatalogueLab();
const { post } = lab;

// Invented, plausible values: they exercise the API, not any published property.
const substrateBody = (name: string) => ({
  name,
  substrateClass: 'pet-film',
  thicknessUm: 125,
  maxContinuousTempC: 120,
  maxShortExposureTempC: 150,
  maxShortExposureSeconds: 60,
});

describeCatalogue(() => lab.t, {
  noun: 'substrate',
  path: '/api/substrates',
  listKey: 'substrates',
  entityType: 'substrate',
  model: SubstrateModel,
  outputSchema: SubstrateSchema,
  nameField: 'name',
  validBody: substrateBody,
  change: { thicknessUm: 100, isTransferCarrier: true },
  badChanges: [
    ['a thickness sent as the text "NaN"', { thicknessUm: 'NaN' }],
    ['SQL in a number field', { maxContinuousTempC: '0 OR 1=1' }],
    ['a short-exposure limit below the continuous one', { maxShortExposureTempC: 100 }],
    ['only the water contact angle', { waterContactAngleDeg: 80 }],
    ['a contact angle over 180°', { waterContactAngleDeg: 181, diiodomethaneContactAngleDeg: 30 }],
    ['an unknown substrate class', { substrateClass: 'cardboard' }],
    ['"yes" for the transfer-carrier flag', { isTransferCarrier: 'yes' }],
  ],
});

// Inks built from REFERENCES §2.3 liquids; viscosity and density are invented (wetting ignores them).
const inkOf = (name: string, total: number, dispersive: number | null, polar: number | null) => ({
  name: uniqueName(name),
  function: 'graphic',
  viscosityMilliPaS: 8,
  densityKgPerM3: 1050,
  solidsWtPercent: 5,
  surfaceTensionMilliNPerM: total,
  surfaceTensionDispersiveMilliNPerM: dispersive,
  surfaceTensionPolarMilliNPerM: polar,
});

describe('GET /api/substrates/:id/wetting', () => {
  it('when a substrate has contact angles, then its OWRK surface energy is given with each ink in use’s margin and angle', async () => {
    // REFERENCES §2.3 [D]: θW = 72.5°, θD = 27.0° → 45.414 + 4.945 = 50.359 mN/m (±0.05)
    const substrate = await post('/api/substrates', { ...substrateBody(uniqueName('PET-like')), waterContactAngleDeg: 72.5, diiodomethaneContactAngleDeg: 27 });
    // REFERENCES §2.3 [D]: an ink of 28.0 = 26.0 + 2.0 spreads (θ = 0°); ethylene glycol 48.0 = 29.0 + 19.0 → 23.65°
    const spreads = await post('/api/inks', inkOf('28 mN/m ink', 28, 26, 2));
    const glycol = await post('/api/inks', inkOf('glycol-like ink', 48, 29, 19));
    const noParts = await post('/api/inks', inkOf('ink without parts', 30, null, null));
    const archived = await post('/api/inks', inkOf('archived ink', 30, null, null));
    await post(`/api/inks/${archived.body.id}/archive`, {});

    const res = await lab.engineer.agent.get(`/api/substrates/${substrate.body.id}/wetting`);
    expect(res.status).toBe(200);
    const wetting = SubstrateWettingSchema.parse(res.body);
    expect(wetting.surfaceEnergy?.source).toBe('owrk-contact-angles');
    expect(wetting.surfaceEnergy?.totalMilliNPerM).toBeCloseTo(50.359, 1);
    const ink = (id: number) => wetting.inks.find((i) => i.inkId === id);
    expect(ink(archived.body.id)).toBeUndefined();
    expect(ink(spreads.body.id)).toMatchObject({ predictedContactAngleDeg: 0, margin: { ok: true } });
    expect(ink(spreads.body.id)?.margin?.marginMilliNPerM).toBeCloseTo(22.359, 1);
    expect(ink(glycol.body.id)?.predictedContactAngleDeg).toBeCloseTo(23.65, 1);
    // 2.359 mN/m is short of the 10 mN/m margin (common practice, no source)
    expect(ink(glycol.body.id)?.margin?.ok).toBe(false);
    expect(ink(noParts.body.id)?.predictedContactAngleDeg).toBeNull();
  });

  it('when a substrate has neither parts nor contact angles, then the surface energy is null with what to record', async () => {
    const substrate = await post('/api/substrates', substrateBody(uniqueName('unmeasured')));
    const res = await lab.engineer.agent.get(`/api/substrates/${substrate.body.id}/wetting`);
    expect(res.body.surfaceEnergy).toBeNull();
    expect(res.body.surfaceEnergyNote).toMatch(/contact angles/);
    for (const row of res.body.inks) expect(row.margin).toBeNull();
  });

  it('when the substrate does not exist, then 404', async () => {
    expect((await lab.engineer.agent.get('/api/substrates/2147483000/wetting')).status).toBe(404);
  });
});
