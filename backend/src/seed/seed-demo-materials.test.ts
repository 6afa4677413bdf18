import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { InkSchema, InstrumentViewSchema, LotViewSchema, PrinterSchema, SubstrateSchema } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';
import { DEMO_HEAT_SOURCES, DEMO_SURFACE_TREATERS } from './demo-equipment';
import { DEMO_INKS, DEMO_SUBSTRATES } from './demo-materials';
import { seedDemoMaterials } from './seed-demo-materials';

let t: TestContext;
let operator: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  // Noon UTC: the same calendar day in the demo lab's zone and in whatever zone the settings hold.
  t.ctx.clock = { now: () => new Date('2026-12-02T12:00:00Z') };
  await t.ctx.sequelize.transaction((transaction) => seedDemoMaterials(t.ctx, transaction));
  operator = await signedInUser(t.app, 'operator');
});
afterAll(() => t.close());

const listed = async (path: string, key: string, q: string) => {
  const res = await operator.agent.get(path).query({ q });
  expect(res.status).toBe(200);
  return res.body[key] as unknown[];
};

describe('demo materials and equipment', () => {
  it('when seeded, then every demo ink and substrate reads back through the API and parses with its schema', async () => {
    for (const ink of Object.values(DEMO_INKS)) {
      const [found] = await listed('/api/inks', 'inks', ink.name);
      expect(InkSchema.parse(found).solvents.length).toBeGreaterThan(0);
    }
    for (const substrate of Object.values(DEMO_SUBSTRATES)) {
      expect(SubstrateSchema.parse((await listed('/api/substrates', 'substrates', substrate.name))[0]).name).toBe(substrate.name);
    }
    expect(await AuditEventModel.count({ where: { action: 'seed.ink', actorId: null } })).toBeGreaterThanOrEqual(4);
  });

  it('when seeded, then the silver ink carries its solvents’ hazard codes and pictograms', async () => {
    const [silver] = await listed('/api/inks', 'inks', DEMO_INKS.silver.name);
    const solvents = InkSchema.parse(silver).solvents;
    expect(solvents.map((s) => [s.name, s.hazardCodes, s.pictograms])).toEqual([
      ['Ethanol', ['H225'], ['GHS02']],
      ['Ethylene glycol', ['H302', 'H373'], ['GHS07', 'GHS08']],
    ]);
  });

  it('when seeded, then one lot shows as expired and one as past its pot life', async () => {
    const status = async (lotNumber: string) => LotViewSchema.parse((await listed('/api/lots', 'lots', lotNumber))[0]).status.flags;
    expect(await status('QD7-2604')).toEqual(['expired']);
    expect(await status('QS30-2609')).toEqual(['past-pot-life']);
    expect(await status('QS30-2611')).toEqual([]);
  });

  it('when seeded, then both printers have named channels loaded with demo inks', async () => {
    const [north] = await listed('/api/printers', 'printers', 'Bench printer North');
    const [silver] = await listed('/api/inks', 'inks', DEMO_INKS.silver.name);
    const channels = PrinterSchema.parse(north).channels;
    expect(channels.map((c) => c.name)).toEqual(['Ag conductor', 'Cover dielectric', 'Spare']);
    expect(channels[0]?.inkId).toBe((silver as { id: number }).id);
    expect(await listed('/api/printers', 'printers', 'Bench printer South')).toHaveLength(1);
  });

  it('when seeded, then one instrument is past calibration and the heat sources and treaters are there', async () => {
    const [goniometer] = await listed('/api/instruments', 'instruments', 'Contact-angle goniometer CA-1');
    expect(InstrumentViewSchema.parse(goniometer).status.state).toBe('overdue');
    for (const heat of DEMO_HEAT_SOURCES) expect(await listed('/api/heat-sources', 'heatSources', heat.name)).toMatchObject([{ kind: heat.kind }]);
    for (const treater of DEMO_SURFACE_TREATERS) {
      expect(await listed('/api/surface-treaters', 'surfaceTreaters', treater.name)).toMatchObject([{ method: treater.method }]);
    }
  });
});
