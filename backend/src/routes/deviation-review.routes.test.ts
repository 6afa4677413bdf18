import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AuditEventModel } from '../models/audit-event.model';
import { DeviationEventModel } from '../models/deviation-event.model';
import { DeviationModel } from '../models/deviation.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { assign, comment, freshRun, getDetail, reportProblem, stateOf } from '../../test/quality-fixtures';
import { post } from '../../test/run-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let quality: SignedIn;
let colleague: SignedIn;
let operator: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  [engineer, quality, colleague, operator] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'operator')]);
});
afterAll(() => t.close());

async function openDeviation() {
  const run = await freshRun(engineer, 3);
  const id = await reportProblem(operator, run.id, { severity: 'minor', pieceIds: [run.pieces[1]?.id as number], description: 'Trace 2 looks thin.' });
  return { run, id };
}

describe('deviation detail', () => {
  it('when quality opens a reported deviation, then it shows its run, step, pieces, history and a content hash', async () => {
    const { run, id } = await openDeviation();
    const detail = await getDetail(engineer, id);
    expect(detail).toMatchObject({ id, state: 'open', rule: 'reported', run: { id: run.id, code: run.code, state: 'planned', versionNumber: 1 }, step: { id: 'print-ag-1', kind: 'print-pass', number: 2 } });
    expect(detail.pieces).toEqual([{ id: run.pieces[1]?.id, code: run.pieces[1]?.code }]);
    expect(detail.events).toEqual([expect.objectContaining({ kind: 'created', by: { id: operator.user.id, name: operator.user.name } })]);
    expect(detail.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect([detail.dispositions, detail.closure]).toEqual([[], null]);
    expect((await getDetail(quality, id)).contentHash).toBe(detail.contentHash);
  });

  it('when the deviation does not exist or the id is not a number, then 404 or 400', async () => {
    expect((await quality.agent.get('/api/deviations/99999999')).status).toBe(404);
    expect((await quality.agent.get('/api/deviations/abc')).status).toBe(400);
  });
});

describe('assigning and commenting', () => {
  it('when quality assigns an open deviation with a new severity, then it is in review, both changes are in its history and audit, and its hash changes', async () => {
    const { id } = await openDeviation();
    const before = (await getDetail(quality, id)).contentHash;
    const res = await assign(quality, id, { assigneeId: colleague.user.id, severity: 'major' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ state: 'in-review', severity: 'major', assignee: { id: colleague.user.id } });
    expect(res.body.contentHash).not.toBe(before);
    expect(res.body.events.map((e: { kind: string }) => e.kind)).toEqual(['created', 'assigned', 'severity-changed']);
    const audit = await AuditEventModel.findOne({ where: { action: 'deviation.assigned', entityId: String(id) } });
    expect(audit?.actorId).toBe(quality.user.id);
  });

  it('when the deviation is assigned again to the same person, then nothing new is written', async () => {
    const { id } = await openDeviation();
    await assign(quality, id);
    const events = await DeviationEventModel.count({ where: { deviationId: id } });
    expect((await assign(quality, id)).status).toBe(200);
    expect(await DeviationEventModel.count({ where: { deviationId: id } })).toBe(events);
  });

  it('when the assignee is not an active quality person, then 422 names the field and nothing changes', async () => {
    const { id } = await openDeviation();
    const res = await assign(quality, id, { assigneeId: operator.user.id });
    expect(res.status).toBe(422);
    expect(res.body.error.details.fieldErrors.assigneeId).toBeDefined();
    expect(await stateOf(id)).toBe('open');
  });

  it('when quality comments, then the comment joins the history without changing the content hash', async () => {
    const { id } = await openDeviation();
    const hash = (await getDetail(quality, id)).contentHash;
    const res = await comment(quality, id, 'Checked under the scope: 0.82 mm wide.');
    expect(res.status).toBe(201);
    expect(res.body.events.at(-1)).toMatchObject({ kind: 'comment', text: 'Checked under the scope: 0.82 mm wide.', by: { id: quality.user.id } });
    expect(res.body.contentHash).toBe(hash);
    expect(await AuditEventModel.count({ where: { action: 'deviation.commented', entityId: String(id) } })).toBe(1);
  });

  it.each([
    ['an empty comment', { text: '   ' }],
    ['a comment of 4001 characters', { text: 'x'.repeat(4001) }],
  ])('when quality sends %s, then 400 and no history line is added', async (_label, body) => {
    const { id } = await openDeviation();
    expect((await post(quality, `/api/deviations/${id}/comments`, body)).status).toBe(400);
    expect(await DeviationEventModel.count({ where: { deviationId: id, kind: 'comment' } })).toBe(0);
  });

  it('when an engineer or operator tries to assign or comment, then 403 and nothing changes', async () => {
    const { id } = await openDeviation();
    for (const who of [engineer, operator]) {
      expect((await assign(who, id, { assigneeId: quality.user.id })).status).toBe(403);
      expect((await comment(who, id)).status).toBe(403);
    }
    expect((await DeviationModel.findByPk(id))?.assigneeId).toBeNull();
  });
});
