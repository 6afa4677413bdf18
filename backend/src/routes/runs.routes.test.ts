import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { RunDetailSchema, RunListSchema } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { DeviationModel } from '../models/deviation.model';
import { HeatSourceModel } from '../models/heat-source.model';
import { RunModel } from '../models/run.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createLot, createOven, createRunRecords, planRun, post, releasedVersion, runnableContent } from '../../test/run-fixtures';
import { createTestContext, TestClock, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let quality: SignedIn;
let operator: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  t.ctx.clock = new TestClock();
  [engineer, quality, operator] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'operator')]);
});
afterAll(() => t.close());

/** Fresh records and a released version of the runnable recipe, so a test may change them freely. */
async function setup() {
  const records = await createRunRecords();
  const version = await releasedVersion(runnableContent(records));
  return { records, ...version };
}

const rulesOf = async (runId: number) => (await DeviationModel.findAll({ where: { runId }, order: [['id', 'ASC']] })).map((d) => d.rule);

describe('planning a run', () => {
  it('when an engineer plans a released version, then it is planned with its pieces, machines, step records, traveller link and an audit row', async () => {
    const { records, versionId, recipeId, code } = await setup();
    const lot = await createLot('ink', records.inkId, { expiresOn: '2999-12-31' });
    const run = await planRun(engineer, { versionId, quantity: 3, dueOn: '2026-12-24', lots: [{ lotId: lot.id }], notes: 'Pilot batch' });
    expect(run).toMatchObject({ state: 'planned', recipeId, recipeCode: code, versionNumber: 1, quantity: 3, doneSteps: 0, totalSteps: 5, openDeviations: 0, notes: 'Pilot batch' });
    expect(run.code).toMatch(/^R-\d{4}-\d{4,}$/);
    expect(run.pieces.map((p) => p.code)).toEqual([`${run.code}-01`, `${run.code}-02`, `${run.code}-03`]);
    expect(run.steps.map((s) => `${s.stepId}:${s.state}`)).toEqual(['plasma-1:pending', 'print-ag-1:pending', 'dry-ag-1:pending', 'cure-ag-1:pending', 'inspect-1:pending']);
    expect(run.equipment.map((e) => `${e.kind}:${e.id}`).sort()).toEqual([`heat-source:${records.ovenId}`, `printer:${records.printerId}`, `surface-treater:${records.treaterId}`].sort());
    expect(run.lots).toEqual([expect.objectContaining({ lotId: lot.id, materialType: 'ink', flags: [], reason: null })]);
    expect(run.travellerUrl).toBe(`http://tablet.lab.example:8080/run/${run.id}`);
    expect(run.serverTime).toBe(t.ctx.clock.now().toISOString());
    expect(run.safetyNotes['print-ag-1']?.map((n) => n.code)).toEqual(expect.arrayContaining(['no-ignition', 'nanoparticle', 'sds']));
    expect(run.safetyNotes['plasma-1']).toEqual([]);
    expect(run.inks.map((i) => i.id)).toEqual([records.inkId]);
    expect(await AuditEventModel.count({ where: { action: 'run.planned', entityId: String(run.id), actorId: engineer.user.id } })).toBe(1);
    const read = await operator.agent.get(`/api/runs/${run.id}`);
    expect(RunDetailSchema.parse(read.body).code).toBe(run.code);
  });

  it('when the version is a draft, or the lot is of a material the version does not use, then 422 names the field and no run is made', async () => {
    const { records } = await setup();
    const draft = await releasedVersion(runnableContent(records), 'draft');
    const res = await post(engineer, '/api/runs', { versionId: draft.versionId, quantity: 2 });
    expect(res.status).toBe(422);
    expect(res.body.error.details.fieldErrors.versionId[0]).toMatch(/is draft; only released versions can be run/);
    const { versionId } = await setup();
    const foreign = await createLot('ink', (await createRunRecords()).inkId);
    const wrongLot = await post(engineer, '/api/runs', { versionId, quantity: 2, lots: [{ lotId: foreign.id }] });
    expect(wrongLot.status).toBe(422);
    expect(wrongLot.body.error.details.fieldErrors['lots.0.lotId'][0]).toMatch(/does not use/);
    expect((await post(engineer, '/api/runs', { versionId: 99_999_999, quantity: 2 })).status).toBe(404);
    expect(await RunModel.count({ where: { versionId: [draft.versionId, versionId] } })).toBe(0);
  });

  it('when an expired lot is chosen without a reason, then 400 names it; with a reason, then the run is planned and an expired-lot deviation opens', async () => {
    const { records, versionId } = await setup();
    const lot = await createLot('ink', records.inkId, { expiresOn: '2020-01-31' });
    const refused = await post(engineer, '/api/runs', { versionId, quantity: 1, lots: [{ lotId: lot.id }] });
    expect(refused.status).toBe(400);
    expect(refused.body.error.details.fieldErrors['lots.0.reason'][0]).toMatch(new RegExp(`Lot ${lot.lotNumber} .* expired on 2020-01-31`));
    const run = await planRun(engineer, { versionId, quantity: 1, lots: [{ lotId: lot.id, reason: 'Only lot left; sheet resistance checked today.' }] });
    expect(run.deviations).toEqual([expect.objectContaining({ rule: 'expired-lot', severity: 'major', state: 'open', stepId: null })]);
    expect(run.deviations[0]?.actual).toMatch(/Reason given: Only lot left/);
    expect(run.lots[0]).toMatchObject({ flags: ['expired'], reason: 'Only lot left; sheet resistance checked today.' });
    expect(run.openDeviations).toBe(1);
  });

  it('when an opened ink lot is past its pot life, then it needs a reason and opens a lot-past-pot-life deviation', async () => {
    const { records, versionId } = await setup();
    const lot = await createLot('ink', records.inkId, { openedOn: '2020-01-01' });
    expect((await post(engineer, '/api/runs', { versionId, quantity: 1, lots: [{ lotId: lot.id, reason: '  ' }] })).status).toBe(400);
    const run = await planRun(engineer, { versionId, quantity: 1, lots: [{ lotId: lot.id, reason: 'Viscosity re-measured in range.' }] });
    expect(await rulesOf(run.id)).toEqual(['lot-past-pot-life']);
  });

  it('when the version’s own oven is past calibration, then 400 asks for it with a reason; listed with one, then a calibration-overdue deviation opens', async () => {
    const { records, versionId } = await setup();
    await HeatSourceModel.update({ calibrationDueOn: '2020-03-01' }, { where: { id: records.ovenId } });
    const refused = await post(engineer, '/api/runs', { versionId, quantity: 1 });
    expect(refused.status).toBe(400);
    expect(refused.body.error.details.formErrors[0]).toMatch(/was due for calibration on 2020-03-01.*with a reason/);
    const run = await planRun(engineer, { versionId, quantity: 1, equipment: [{ kind: 'heat-source', id: records.ovenId, reason: 'Checked with the logger this morning.' }] });
    expect(run.deviations).toEqual([expect.objectContaining({ rule: 'calibration-overdue', severity: 'minor' })]);
    expect(run.equipment.find((e) => e.id === records.ovenId && e.kind === 'heat-source')).toMatchObject({ reason: 'Checked with the logger this morning.', calibrationDueOn: '2020-03-01' });
  });

  it('when another oven that cannot reach the cure temperature stands in, then the checks block the plan with 422 and their details', async () => {
    const { versionId } = await setup();
    const weak = await createOven(100);
    const res = await post(engineer, '/api/runs', { versionId, quantity: 1, equipment: [{ kind: 'heat-source', id: weak.id }] });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(new RegExp(`With ${weak.name} in place`));
    expect(res.body.error.details.summary.isBlocked).toBe(true);
    expect(res.body.error.details.checks.some((c: { family: string; status: string }) => c.family === 'heat' && c.status === 'blocked')).toBe(true);
    expect(await RunModel.count({ where: { versionId } })).toBe(0);
  });

  it('when another oven that passes the checks stands in, then the run uses it in place of the version’s, in its machines and its content', async () => {
    const { records, versionId } = await setup();
    const other = await createOven(250);
    const run = await planRun(engineer, { versionId, quantity: 1, equipment: [{ kind: 'heat-source', id: other.id }] });
    const ovens = run.equipment.filter((e) => e.kind === 'heat-source').map((e) => e.id);
    expect(ovens).toEqual([other.id]);
    const cure = run.content.steps.find((s) => s.id === 'cure-ag-1');
    expect(cure?.kind === 'cure' && cure.params.heatSourceId).toBe(other.id);
    expect(run.content.heatSourceIds).toEqual([other.id]);
    expect(records.ovenId).not.toBe(other.id);
  });

  it('when an operator tries to plan, hold or cancel, then 403 and nothing changes', async () => {
    const { versionId } = await setup();
    expect((await post(operator, '/api/runs', { versionId, quantity: 1 })).status).toBe(403);
    const run = await planRun(quality, { versionId, quantity: 1 });
    expect((await post(operator, `/api/runs/${run.id}/hold`, { reason: 'No reason' })).status).toBe(403);
    expect((await post(operator, `/api/runs/${run.id}/cancel`, { reason: 'No reason' })).status).toBe(403);
    expect((await RunModel.findByPk(run.id))?.state).toBe('planned');
  });

  it.each([
    ['no quantity', { quantity: undefined }],
    ['a quantity of 0', { quantity: 0 }],
    ['a fractional quantity', { quantity: 2.5 }],
    ['a quantity as text', { quantity: 'many' }],
    ['a lot id as SQL', { lots: [{ lotId: "1; DROP TABLE runs" }] }],
  ])('when the plan has %s, then 400 and no run is made', async (_label, change) => {
    const { versionId } = await setup();
    const res = await post(engineer, '/api/runs', { versionId, quantity: 2, ...change });
    expect(res.status).toBe(400);
    expect(await RunModel.count({ where: { versionId } })).toBe(0);
  });
});

describe('holding, resuming and cancelling', () => {
  it('when a run is held, then tablet writes get 409 with the hold reason; resumed, they go through; cancelled, it is final', async () => {
    const { versionId } = await setup();
    const run = await planRun(engineer, { versionId, quantity: 1 });
    expect((await post(engineer, `/api/runs/${run.id}/hold`, {})).status).toBe(400);
    const held = await post(quality, `/api/runs/${run.id}/hold`, { reason: 'Printer head being cleaned' });
    expect(held.status).toBe(200);
    expect(held.body).toMatchObject({ state: 'on-hold', holdReason: 'Printer head being cleaned' });
    const refused = await post(operator, `/api/runs/${run.id}/steps/plasma-1/start`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/is on hold \(Printer head being cleaned\)/);
    expect((await post(engineer, `/api/runs/${run.id}/hold`, { reason: 'Again' })).status).toBe(409);
    const resumed = await post(engineer, `/api/runs/${run.id}/resume`, { reason: 'Head clean' });
    expect(resumed.body).toMatchObject({ state: 'in-progress', holdReason: null });
    expect((await post(operator, `/api/runs/${run.id}/steps/plasma-1/start`)).status).toBe(200);
    expect((await post(engineer, `/api/runs/${run.id}/cancel`, { reason: 'Customer withdrew the order' })).body.state).toBe('cancelled');
    const final = await post(engineer, `/api/runs/${run.id}/resume`, { reason: 'Oops' });
    expect(final.status).toBe(409);
    expect(final.body.error.message).toMatch(/A cancelled run cannot move on/);
    expect((await post(operator, `/api/runs/${run.id}/steps/plasma-1/complete`)).status).toBe(409);
    const actions = (await AuditEventModel.findAll({ where: { entityType: 'run', entityId: String(run.id) }, order: [['id', 'ASC']] })).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['run.planned', 'run.held', 'run.resumed', 'run.cancelled']));
  });
});

describe('listing runs', () => {
  it('when runs are listed by recipe code and state, then the matching ones come back newest first with their progress', async () => {
    const { versionId, code } = await setup();
    const first = await planRun(engineer, { versionId, quantity: 1 });
    const second = await planRun(engineer, { versionId, quantity: 2 });
    await post(engineer, `/api/runs/${first.id}/hold`, { reason: 'Waiting for film' });
    const all = RunListSchema.parse((await operator.agent.get('/api/runs').query({ q: code })).body);
    expect(all.total).toBe(2);
    expect(all.runs.map((r) => r.id)).toEqual([second.id, first.id]);
    expect(all.runs[0]).toMatchObject({ recipeCode: code, totalSteps: 5, doneSteps: 0, createdBy: { id: engineer.user.id } });
    const held = RunListSchema.parse((await operator.agent.get('/api/runs').query({ q: code, state: 'on-hold' })).body);
    expect(held.runs.map((r) => r.id)).toEqual([first.id]);
    const paged = RunListSchema.parse((await operator.agent.get('/api/runs').query({ q: code, pageSize: 1, page: 2 })).body);
    expect(paged).toMatchObject({ total: 2, runs: [{ id: first.id }] });
    expect((await operator.agent.get('/api/runs').query({ state: 'sideways' })).status).toBe(400);
    expect((await operator.agent.get('/api/runs').query({ state: '' })).status).toBe(200);
  });
});
