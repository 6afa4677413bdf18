import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { RunSignOffViewSchema } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { RunSignOffModel } from '../models/run-sign-off.model';
import { RunModel } from '../models/run.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { completeRun, disposition, freshRun, reportProblem, SIGN } from '../../test/quality-fixtures';
import { post } from '../../test/run-fixtures';
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

const signOff = (who: SignedIn, runId: number, body: object = SIGN) => post(who, `/api/runs/${runId}/sign-off`, body);
const view = async (who: SignedIn, runId: number) => RunSignOffViewSchema.parse((await who.agent.get(`/api/runs/${runId}/sign-off`)).body);

/** A completed run of one piece with one reported deviation still open. */
async function completedWithDeviation() {
  const run = await freshRun(engineer, 1);
  const deviationId = await reportProblem(operator, run.id, { severity: 'minor', description: 'Small smudge on the tail.' });
  await completeRun(operator, run.id);
  return { run, deviationId };
}

describe('run sign-off', () => {
  it('when the run is not completed, then 409 says only a completed run can be signed off', async () => {
    const run = await freshRun(engineer, 1);
    const res = await signOff(quality, run.id);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe(`Run ${run.code} is planned; only a completed run can be signed off.`);
  });

  it('when a deviation of the run has no disposition, then 409 names it; once it is dispositioned, then the run is signed off and closed', async () => {
    const { run, deviationId } = await completedWithDeviation();
    const refused = await signOff(quality, run.id);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(new RegExp(`cannot be signed off: 1 deviation has no disposition yet \\(#${deviationId} .* is open\\)`));
    expect(refused.body.error.details.undecided).toEqual([expect.objectContaining({ id: deviationId, state: 'open' })]);
    expect((await disposition(quality, deviationId, {})).status).toBe(200);
    const before = await view(quality, run.id);
    expect(before).toMatchObject({ canSignOff: true, refusal: null, signature: null, runState: 'completed' });
    const res = await signOff(quality, run.id, { ...SIGN, contentHash: before.contentHash });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(RunSignOffViewSchema.parse(res.body)).toMatchObject({ runState: 'closed', signature: { signedBy: quality.user.name, meaning: 'run record approved', contentHash: before.contentHash } });
    expect((await RunModel.findByPk(run.id))?.state).toBe('closed');
    expect(await RunSignOffModel.count({ where: { runId: run.id } })).toBe(1);
    expect(await AuditEventModel.count({ where: { action: 'run.signed-off', entityId: String(run.id), actorId: quality.user.id } })).toBe(1);
    expect((await view(operator, run.id)).signature?.signedBy).toBe(quality.user.name);
  });

  it('when the run is signed off, then it takes no more records and cannot be signed off again', async () => {
    const run = await freshRun(engineer, 1);
    await completeRun(operator, run.id);
    expect((await signOff(quality, run.id)).status).toBe(200);
    const problem = await post(operator, `/api/runs/${run.id}/problems`, { description: 'Late note.', severity: 'minor' });
    expect(problem.status).toBe(409);
    const again = await signOff(quality, run.id);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toBe(`Run ${run.code} is already signed off.`);
  });

  it('when the password is wrong, then 401, the refusal is audited, and the run stays completed', async () => {
    const run = await freshRun(engineer, 1);
    await completeRun(operator, run.id);
    const res = await signOff(quality, run.id, { password: 'not-mine-at-all' });
    expect(res.status).toBe(401);
    expect(res.body.error.details.fieldErrors.password).toBeDefined();
    expect(await AuditEventModel.count({ where: { action: 'signature.refused', entityType: 'run', entityId: String(run.id) } })).toBe(1);
    expect((await RunModel.findByPk(run.id))?.state).toBe('completed');
  });

  it('when the record changed since it was reviewed, then 409 and nothing is signed', async () => {
    const { run, deviationId } = await completedWithDeviation();
    const seen = (await view(quality, run.id)).contentHash;
    expect((await disposition(quality, deviationId, {})).status).toBe(200);
    const res = await signOff(quality, run.id, { ...SIGN, contentHash: seen });
    expect(res.status).toBe(409);
    expect(await RunSignOffModel.count({ where: { runId: run.id } })).toBe(0);
  });

  it('when an engineer or operator tries to sign off, then 403; without a password, then 400', async () => {
    const run = await freshRun(engineer, 1);
    expect((await signOff(engineer, run.id)).status).toBe(403);
    expect((await signOff(operator, run.id)).status).toBe(403);
    expect((await signOff(quality, run.id, {})).status).toBe(400);
    expect((await quality.agent.get('/api/runs/99999999/sign-off')).status).toBe(404);
  });
});
