import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AuditEventModel } from '../models/audit-event.model';
import { DeviationDispositionModel } from '../models/deviation-disposition.model';
import { DeviationEventModel } from '../models/deviation-event.model';
import { DeviationModel } from '../models/deviation.model';
import { SignatureModel } from '../models/signature.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { assign, closeIt, comment, completeRun, disposition, freshRun, getDetail, reportProblem, stateOf } from '../../test/quality-fixtures';
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

const VERIFIED = 'Door interlock fitted; five cures logged in window since.';

/** A deviation dispositioned "use as is" with a corrective action owned by the engineer. */
async function dispositioned(withAction = true) {
  const run = await freshRun(engineer, 1);
  const id = await reportProblem(operator, run.id, { severity: 'major' });
  const correctiveAction = withAction ? { note: 'Fit an interlock to the oven door.', ownerId: engineer.user.id, dueOn: '2027-01-15' } : null;
  const res = await disposition(quality, id, { correctiveAction });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return { run, id };
}

describe('closing a deviation', () => {
  it('when the deviation is not dispositioned yet, then 409 says so and nothing is signed', async () => {
    const run = await freshRun(engineer, 1);
    const id = await reportProblem(operator, run.id);
    const res = await closeIt(quality, id);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/is still open: disposition it first, so it cannot be closed/);
    expect(await SignatureModel.count({ where: { entityType: 'deviation', entityId: id } })).toBe(0);
  });

  it('when a corrective action has no verification note, then 422 at verificationNote and it stays dispositioned', async () => {
    const { id } = await dispositioned();
    const res = await closeIt(quality, id, { verificationNote: '  ' });
    expect(res.status).toBe(422);
    expect(res.body.error.details.fieldErrors.verificationNote[0]).toMatch(/say how it was verified/);
    expect(await stateOf(id)).toBe('dispositioned');
  });

  it('when the password is wrong, then 401, the refusal joins the history, and it stays dispositioned', async () => {
    const { id } = await dispositioned();
    expect((await closeIt(quality, id, { verificationNote: VERIFIED, password: 'wrong-one' })).status).toBe(401);
    expect(await DeviationEventModel.count({ where: { deviationId: id, kind: 'signature-refused' } })).toBe(1);
    expect(await stateOf(id)).toBe('dispositioned');
  });

  it('when quality closes with the verification, then the corrective action is verified, the closure is signed, and it is audited', async () => {
    const { id } = await dispositioned();
    const { contentHash } = await getDetail(quality, id);
    const res = await closeIt(quality, id, { verificationNote: VERIFIED, contentHash });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ state: 'closed', closure: { verificationNote: VERIFIED, signature: { signedBy: quality.user.name, meaning: 'deviation closed', contentHash } } });
    expect(res.body.dispositions[0].correctiveAction).toMatchObject({ owner: { id: engineer.user.id }, dueOn: '2027-01-15', verifiedAt: expect.any(String) });
    expect((await DeviationDispositionModel.findOne({ where: { deviationId: id } }))?.verificationNote).toBe(VERIFIED);
    expect(res.body.events.at(-1)).toMatchObject({ kind: 'closed', text: `Closed. Verification: ${VERIFIED}` });
    expect(await AuditEventModel.count({ where: { action: 'deviation.closed', entityId: String(id) } })).toBe(1);
  });

  it('when a disposition without corrective action is closed without a note, then it closes', async () => {
    const { id } = await dispositioned(false);
    expect((await closeIt(quality, id)).status).toBe(200);
    expect(await stateOf(id)).toBe('closed');
  });
});

describe('a closed deviation is read-only', () => {
  it('when anyone writes to a closed deviation through the API, then 409 and nothing changes', async () => {
    const { id } = await dispositioned(false);
    expect((await closeIt(quality, id)).status).toBe(200);
    const before = await DeviationModel.findByPk(id);
    const writes = [comment(quality, id), assign(quality, id), disposition(quality, id, {}), closeIt(quality, id)];
    for (const res of await Promise.all(writes)) {
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/is closed, and a closed deviation is a final record/);
    }
    expect((await DeviationModel.findByPk(id))?.revision).toBe(before?.revision);
    expect(await DeviationEventModel.count({ where: { deviationId: id, kind: 'comment' } })).toBe(0);
  });

  it('when the application account changes a closed deviation, its dispositions or its history by raw SQL, then the database refuses', async () => {
    const { id } = await dispositioned();
    expect((await closeIt(quality, id, { verificationNote: VERIFIED })).status).toBe(200);
    const sql = (text: string) => t.ctx.sequelize.query(text);
    await expect(sql(`UPDATE deviations SET title = 'tampered' WHERE id = ${id}`)).rejects.toThrow(/closed deviations are read-only/);
    await expect(sql(`UPDATE deviation_dispositions SET rationale = 'tampered' WHERE deviation_id = ${id}`)).rejects.toThrow(/kept as signed/);
    await expect(sql(`UPDATE deviation_dispositions SET verification_note = 'again' WHERE deviation_id = ${id}`)).rejects.toThrow(/kept as signed/);
    await expect(sql(`DELETE FROM deviation_events WHERE deviation_id = ${id}`)).rejects.toThrow(/append-only/);
    expect((await DeviationModel.findByPk(id))?.title).not.toBe('tampered');
  });
});

describe('closing a rework', () => {
  it('when the rework run is not completed, then closing is refused naming it; once it is, then the deviation closes', async () => {
    const run = await freshRun(engineer, 1);
    const id = await reportProblem(operator, run.id, { severity: 'major' });
    const reworked = await disposition(quality, id, { disposition: 'rework', reworkStepIds: ['cure-ag-1'], rationale: 'Cure it again for the full time.' });
    expect(reworked.status, JSON.stringify(reworked.body)).toBe(200);
    const reworkRunId = reworked.body.dispositions[0].reworkRunId as number;
    const refused = await closeIt(quality, id);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/^Rework run R-\d{4}-\d{4,} is planned; close the deviation once the rework is completed\.$/);
    await completeRun(operator, reworkRunId, ['cure-ag-1']);
    expect((await operator.agent.get(`/api/runs/${reworkRunId}`)).body.state).toBe('completed');
    expect((await closeIt(quality, id)).status).toBe(200);
  });
});
