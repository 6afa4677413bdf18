import { describe, expect, it } from 'vitest';

import { InkInputSchema, InkPrintabilitySchema, InkSchema } from '@tracewright/shared';

import { InkModel } from '../models/ink.model';
import { setUpCatalogueLab } from '../../test/catalogue-lab';
import { describeCatalogue, uniqueName } from '../../test/catalogue-contract';

const lab = setUpCatalogueLab();
const { post } = lab;

// Invented, plausible values: they exercise the API, not any published property.
const inkBody = (name: string) => ({
  name,
  function: 'conductor',
  viscosityMilliPaS: 11,
  surfaceTensionMilliNPerM: 32,
  densityKgPerM3: 1450,
  solidsWtPercent: 30,
  sheetResistanceOhmPerSq: 0.08,
  solvents: [{ name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['H225'], pictograms: ['GHS02'], signalWord: 'Danger' }],
});

describeCatalogue(() => lab.t, {
  noun: 'ink',
  path: '/api/inks',
  listKey: 'inks',
  entityType: 'ink',
  model: InkModel,
  outputSchema: InkSchema,
  nameField: 'name',
  validBody: inkBody,
  change: { viscosityMilliPaS: 12.5 },
  badChanges: [
    ['a viscosity sent as the text "NaN"', { viscosityMilliPaS: 'NaN' }],
    ['a viscosity sent as the text "12"', { viscosityMilliPaS: '12' }],
    ['SQL in a number field', { densityKgPerM3: '1; DROP TABLE inks;--' }],
    ['a negative viscosity', { viscosityMilliPaS: -1 }],
    ['an unknown ink function', { function: 'magic' }],
    ['a conductor without its sheet resistance', { sheetResistanceOhmPerSq: null }],
    ['a malformed hazard code', { solvents: [{ name: 'Ethanol', hazardCodes: ['flammable'] }] }],
  ],
});

describe('ink solvents', () => {
  it('when an ink has two solvents with hazard codes, then they come back whole and in order', async () => {
    // Codes as REFERENCES §7.2 lists them (ethanol harmonised H225; ethylene glycol per ICSC 0270).
    const solvents = [
      { name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['H225'], pictograms: ['GHS02'], signalWord: 'Danger' },
      { name: 'Ethylene glycol', casNumber: '107-21-1', hazardCodes: ['H302', 'H373'], pictograms: ['GHS07', 'GHS08'], signalWord: 'Warning' },
    ];
    const created = await post('/api/inks', { ...inkBody(uniqueName('two solvents')), solvents });
    expect((await lab.engineer.agent.get(`/api/inks/${created.body.id}`)).body.solvents).toEqual(solvents);
  });
});

describe('GET /api/inks/:id/printability', () => {
  const printerBody = (nozzleDiameterUm: number) => ({
    name: uniqueName(`${nozzleDiameterUm} µm head`),
    nozzleDiameterUm,
    dropVolumePl: 10,
    jettingSpeedMetresPerSecond: 6,
    nativeDpi: 1270,
    channels: [{ name: 'C1' }],
  });

  it('when asked for an ink, then each printer in use gets Z and verdicts in both windows, and archived printers are left out', async () => {
    // 50 wt % glycerol–water at 20 °C: η 6.00, ρ 1126 derived and γ ≈ 70 from memory (REFERENCES §1.3);
    // 20 wt % silver solids at 10 490 kg/m³ (from memory, §3.1) in the mixture density 1220.9 kg/m³.
    const ink = await post('/api/inks', {
      ...inkBody(uniqueName('glycerol-water')),
      function: 'graphic',
      viscosityMilliPaS: 6.0,
      surfaceTensionMilliNPerM: 70,
      densityKgPerM3: 1126,
      solidsWtPercent: 0,
    });
    const small = await post('/api/printers', printerBody(21));
    const large = await post('/api/printers', printerBody(50));
    const gone = await post('/api/printers', printerBody(30));
    await post(`/api/printers/${gone.body.id}/archive`, {});

    const res = await lab.engineer.agent.get(`/api/inks/${ink.body.id}/printability`);
    expect(res.status).toBe(200);
    const fit = InkPrintabilitySchema.parse(res.body);
    const row = (id: number) => fit.printers.find((p) => p.printerId === id);
    expect(row(gone.body.id)).toBeUndefined();
    // REFERENCES §1.4 [D]: through 21 µm at 6 m/s Z = 6.782 (±0.2 %), inside 1 < Z < 10 and 4 ≤ Z ≤ 14
    const at21 = row(small.body.id)?.windows ?? [];
    expect(Math.abs((at21[0]?.result.z ?? 0) / 6.782 - 1)).toBeLessThan(0.002);
    expect(at21.map((w) => [w.windowId, w.result.verdict])).toEqual([['reis-derby', 'jettable'], ['jang-kim-moon', 'jettable']]);
    // REFERENCES §1.4 [D]: through 50 µm Z = 10.46, just above 1 < Z < 10, inside 4 ≤ Z ≤ 14
    const at50 = row(large.body.id)?.windows ?? [];
    expect(at50.map((w) => w.result.verdict)).toEqual(['satellites', 'jettable']);
    expect(fit.solidsVolumeFraction).toBe(0);
  });

  it('when the solids density is known, then φv is given; when it is not, then null with a note', async () => {
    // REFERENCES §3.2 [D]: 20 wt % Ag (10 490 kg/m³, from memory) in a 1000 kg/m³ carrier → φv = 0.023280;
    // the ink's density is that mixture's, 1/(0.2/10490 + 0.8/1000) = 1220.9 kg/m³.
    const density = 1 / (0.2 / 10_490 + 0.8 / 1000);
    const known = await post('/api/inks', { ...inkBody(uniqueName('silver')), densityKgPerM3: density, solidsWtPercent: 20, solidsDensityKgPerM3: 10_490 });
    const unknown = await post('/api/inks', inkBody(uniqueName('silver, density unknown')));
    const withDensity = (await lab.engineer.agent.get(`/api/inks/${known.body.id}/printability`)).body;
    expect(withDensity.solidsVolumeFraction).toBeCloseTo(0.02328, 4);
    const without = (await lab.engineer.agent.get(`/api/inks/${unknown.body.id}/printability`)).body;
    expect(without.solidsVolumeFraction).toBeNull();
    expect(without.solidsVolumeFractionNote).toMatch(/solids density/);
  });

  it('when a stored ink holds a value no real ink has, then each printer row names the problem instead of a server error', async () => {
    // Written past the API on purpose: rows from before a rule existed must not break the view.
    const broken = await InkModel.create({ ...InkInputSchema.parse(inkBody(uniqueName('broken'))), surfaceTensionMilliNPerM: 0 });
    const printer = await post('/api/printers', printerBody(21));
    const res = await lab.engineer.agent.get(`/api/inks/${broken.id}/printability`);
    expect(res.status).toBe(200);
    const row = InkPrintabilitySchema.parse(res.body).printers.find((p) => p.printerId === printer.body.id);
    expect(row).toMatchObject({ windows: [], problem: expect.stringMatching(/surface ?tension/i) });
    // Archived afterwards so it does not linger among the inks in use in other views.
    await post(`/api/inks/${broken.id}/archive`, {});
  });

  it('when the ink does not exist, then 404; when the id is not a number, then 400', async () => {
    expect((await lab.engineer.agent.get('/api/inks/2147483000/printability')).status).toBe(404);
    expect((await lab.engineer.agent.get('/api/inks/abc/printability')).status).toBe(400);
  });
});
