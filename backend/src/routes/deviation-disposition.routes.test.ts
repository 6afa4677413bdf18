import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AuditEventModel } from '../models/audit-event.model';
import { DeviationDispositionModel } from '../models/deviation-disposition.model';
import { DeviationEventModel } from '../models/deviation-event.model';
import { RunLotModel } from '../models/run-lot.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunModel } from '../models/run.model';
import { SignatureModel } from '../models/signature.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { disposition, freshRun, getDetail, reportProblem, runWithExpiredLot, stateOf } from '../../test/quality-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let quality: SignedIn;
let operator: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  [engineer, quality, operator] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'operator')]);
});
afterAll(() => t.close());

/** A reported deviation naming no pieces, on a run of three. */
async function deviationOnRun() {
  const run = await freshRun(engineer, 3);
  return { run, id: await reportProblem(operator, run.id, { severity: 'major' }) };
}

const nothingSigned = async (id: number) => {
  expect(await SignatureModel.count({ where: { entityType: 'deviation', entityId: id } })).toBe(0);
  expect(await DeviationDispositionModel.count({ where: { deviationId: id } })).toBe(0);
  expect(await stateOf(id)).toBe('open');
};

describe('disposition rules', () => {
  it.each([
    ['no rationale', { rationale: undefined }],
    ['a rationale under 10 characters', { rationale: 'Fine.' }],
    ['no password', { password: undefined }],
    ['an unknown disposition', { disposition: 'keep' }],
    ['a content hash that is not a hash', { contentHash: 'abc' }],
  ])('when the disposition has %s, then 400 and nothing is signed', async (_label, change) => {
    const { id } = await deviationOnRun();
    const res = await disposition(quality, id, change);
    expect(res.status).toBe(400);
    await nothingSigned(id);
  });

  it('when the password is wrong, then 401 at the password field, the refusal is audited and in the history, and nothing is signed', async () => {
    const { id } = await deviationOnRun();
    const res = await disposition(quality, id, { password: 'not-my-password' });
    expect(res.status).toBe(401);
    expect(res.body.error.details.fieldErrors.password).toEqual(['That password is not right.']);
    const refused = await AuditEventModel.findOne({ where: { action: 'signature.refused', entityType: 'deviation', entityId: String(id) } });
    expect(refused?.actorId).toBe(quality.user.id);
    expect(await DeviationEventModel.count({ where: { deviationId: id, kind: 'signature-refused', byId: quality.user.id } })).toBe(1);
    await nothingSigned(id);
  });

  it('when the deviation changed since quality opened it, then 409 and nothing is signed', async () => {
    const { id } = await deviationOnRun();
    const seen = (await getDetail(quality, id)).contentHash;
    expect((await t.ctx.sequelize.query(`UPDATE deviations SET severity = 'critical', revision = revision + 1 WHERE id = ${id}`))).toBeDefined();
    const res = await disposition(quality, id, { contentHash: seen });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/changed since you opened it; nothing was signed/);
    await nothingSigned(id);
  });

  it('when quality signs "use as is" with the hash it reviewed, then the deviation is dispositioned with the signature linked and audited', async () => {
    const { id } = await deviationOnRun();
    const { contentHash } = await getDetail(quality, id);
    const res = await disposition(quality, id, { contentHash });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.state).toBe('dispositioned');
    expect(res.body.dispositions).toEqual([expect.objectContaining({ disposition: 'use-as-is', reworkRunId: null, correctiveAction: null, signature: { signedBy: quality.user.name, meaning: 'deviation dispositioned', signedAt: expect.any(String), contentHash } })]);
    expect(res.body.dispositions[0].pieceIds).toHaveLength(3);
    const row = await DeviationDispositionModel.findOne({ where: { deviationId: id } });
    expect((await SignatureModel.findByPk(row?.signatureId))?.entityId).toBe(id);
    expect(await AuditEventModel.count({ where: { action: 'deviation.dispositioned', entityId: String(id) } })).toBe(1);
    expect((await disposition(quality, id, {})).status).toBe(409);
  });

  it('when pieces are dispositioned one at a time, then it stays in review until every piece has a decision', async () => {
    const { run, id } = await deviationOnRun();
    const [p1, p2, p3] = run.pieces.map((p) => p.id);
    const first = await disposition(quality, id, { disposition: 'scrap', pieceIds: [p1], rationale: 'Piece 1 tore at the tail; not worth saving.' });
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    expect(first.body.state).toBe('in-review');
    const again = await disposition(quality, id, { pieceIds: [p1, p2] });
    expect(again.status).toBe(422);
    expect(again.body.error.details.fieldErrors.pieceIds[0]).toMatch(new RegExp(`Pieces ${p1} already have a disposition`));
    const rest = await disposition(quality, id, {});
    expect(rest.body.state).toBe('dispositioned');
    expect(rest.body.dispositions.map((d: { pieceIds: number[] }) => d.pieceIds)).toEqual([[p1], [p2, p3]]);
  });

  it('when a piece of another run is named, or the corrective action has no such owner, then 422 names the field', async () => {
    const { id } = await deviationOnRun();
    const other = await freshRun(engineer, 1);
    expect((await disposition(quality, id, { pieceIds: [other.pieces[0]?.id] })).body.error.details.fieldErrors.pieceIds).toBeDefined();
    const action = { note: 'Re-train on the oven door interlock.', ownerId: 99_999_999, dueOn: '2027-01-15' };
    const res = await disposition(quality, id, { correctiveAction: action });
    expect(res.status).toBe(422);
    expect(res.body.error.details.fieldErrors['correctiveAction.ownerId']).toBeDefined();
    await nothingSigned(id);
  });

  it('when "return to supplier" is asked for a reported problem, then 422; for an expired lot, then it is signed', async () => {
    const { id } = await deviationOnRun();
    const refused = await disposition(quality, id, { disposition: 'return-to-supplier' });
    expect(refused.status).toBe(422);
    expect(refused.body.error.details.fieldErrors.disposition[0]).toMatch(/only for deviations about a material lot/);
    const lot = await runWithExpiredLot(engineer);
    const res = await disposition(quality, lot.deviationId, { disposition: 'return-to-supplier', rationale: 'Lot past expiry; supplier agreed to credit it.' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.dispositions[0].disposition).toBe('return-to-supplier');
  });

  it('when an engineer tries to disposition, then 403 and nothing is signed', async () => {
    const { id } = await deviationOnRun();
    expect((await disposition(engineer, id, {})).status).toBe(403);
    await nothingSigned(id);
  });
});

describe('rework', () => {
  it('when rework names no steps, or a step the version lacks, then 422 at reworkStepIds and no run is made', async () => {
    const { id } = await deviationOnRun();
    for (const reworkStepIds of [[], ['bake-9']]) {
      const res = await disposition(quality, id, { disposition: 'rework', reworkStepIds });
      expect(res.status).toBe(422);
      expect(res.body.error.details.fieldErrors.reworkStepIds).toBeDefined();
    }
    expect(await RunModel.count({ where: { reworkOfDeviationId: id } })).toBe(0);
  });

  it('when two pieces are sent to rework two steps, then a linked run of the same version repeats those steps on those pieces', async () => {
    const lot = await runWithExpiredLot(engineer);
    const { run, deviationId: id } = lot;
    const [p1, p2] = run.pieces.map((p) => p.id);
    const res = await disposition(quality, id, { disposition: 'rework', reworkStepIds: ['cure-ag-1', 'inspect-1'], rationale: 'Re-cure both strips and measure them again.' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const reworkRunId = res.body.dispositions[0].reworkRunId as number;
    const rework = await RunModel.findByPk(reworkRunId);
    expect(rework).toMatchObject({ reworkOfDeviationId: id, versionId: run.versionId, recipeId: run.recipeId, state: 'planned', quantity: 2 });
    expect(rework?.notes).toMatch(new RegExp(`Rework of deviation #${id} on run ${run.code}: repeats steps 4, 5`));
    const pieces = await RunPieceModel.findAll({ where: { runId: reworkRunId }, order: [['number', 'ASC']] });
    expect(pieces.map((p) => p.reworkOfPieceId)).toEqual([p1, p2]);
    const steps = await RunStepRecordModel.findAll({ where: { runId: reworkRunId }, order: [['id', 'ASC']] });
    expect(steps.map((s) => `${s.stepId}:${s.state}:${s.notNeeded ? 'not-needed' : ''}`)).toEqual([
      'plasma-1:not-done:not-needed',
      'print-ag-1:not-done:not-needed',
      'dry-ag-1:not-done:not-needed',
      'cure-ag-1:pending:',
      'inspect-1:pending:',
    ]);
    expect(await RunLotModel.count({ where: { runId: reworkRunId } })).toBe(1);
    const view = await operator.agent.get(`/api/runs/${reworkRunId}`);
    expect(view.body).toMatchObject({ doneSteps: 0, totalSteps: 5, openDeviations: 0 });
    expect(view.body.steps[0].notDoneReason).toMatch(/Not needed: rework of deviation/);
  });
});
