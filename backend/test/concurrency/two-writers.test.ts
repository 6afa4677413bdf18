import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AuditEventModel } from '../../src/models/audit-event.model';
import { DeviationDispositionModel } from '../../src/models/deviation-disposition.model';
import { RecipeVersionModel } from '../../src/models/recipe-version.model';
import { RunStepRecordModel } from '../../src/models/run-step-record.model';
import { SignatureModel } from '../../src/models/signature.model';
import { versionContent } from '../../src/services/recipe-dto';
import { signedInUser, type SignedIn } from '../fixtures';
import { assign, disposition, freshRun, getDetail, reportProblem } from '../quality-fixtures';
import { createProcessRecords, createRecipe, passingContent, write, type ProcessRecords } from '../recipe-fixtures';
import { newKey, post, startStep } from '../run-fixtures';
import { createTestContext, type TestContext } from '../test-context';

/**
 * Several people writing to one record at the same moment (requests in flight together, not one
 * after the other): exactly one write wins, every other gets a conflict it can act on, and the
 * winner's data is what the database holds.
 */
let t: TestContext;
let engineers: SignedIn[];
let operators: SignedIn[];
let quality: SignedIn[];
let records: ProcessRecords;
beforeAll(async () => {
  t = await createTestContext();
  engineers = await Promise.all([1, 2, 3, 4].map(() => signedInUser(t.app, 'engineer')));
  operators = await Promise.all([1, 2, 3].map(() => signedInUser(t.app, 'operator')));
  quality = await Promise.all([1, 2].map(() => signedInUser(t.app, 'quality')));
  records = await createProcessRecords();
});
afterAll(() => t.close());

const byStatus = <T extends { status: number }>(responses: T[]) => ({
  won: responses.filter((r) => r.status === 200),
  refused: responses.filter((r) => r.status !== 200),
});

describe('two writers on one record', () => {
  it('when four engineers save one draft at the same lock version at once, then one save is kept, three get 409, and a refused one saves after reloading', async () => {
    const { draftId } = await createRecipe(engineers[0] as SignedIn);
    const saves = await Promise.all(
      engineers.map((who, i) => write(who, 'put', `/api/recipe-versions/${draftId}`, { ...passingContent(records, { changeNote: `Edit ${i}` }), lockVersion: 1 })),
    );
    const { won, refused } = byStatus(saves);
    expect(won).toHaveLength(1);
    expect(refused.map((r) => r.status)).toEqual([409, 409, 409]);
    for (const r of refused) expect(r.body.error.message).toMatch(/Someone else saved this draft first.*Nothing was lost/);

    const winner = won[0]?.body as { lockVersion: number; content: { changeNote: string } };
    const row = await RecipeVersionModel.findByPk(draftId);
    expect(versionContent(row as RecipeVersionModel).changeNote).toBe(winner.content.changeNote);
    expect(row?.lockVersion).toBe(2);
    expect(await AuditEventModel.count({ where: { action: 'recipe-version.saved', entityId: String(draftId) } })).toBe(1);

    // The refused engineer reloads (gets the current lock version) and saves: their edit lands on top.
    const loser = engineers[saves.findIndex((r) => r.status === 409)] as SignedIn;
    const current = (await loser.agent.get(`/api/recipe-versions/${draftId}`)).body as { lockVersion: number };
    const retry = await write(loser, 'put', `/api/recipe-versions/${draftId}`, { ...passingContent(records, { changeNote: 'Merged by hand' }), lockVersion: current.lockVersion });
    expect(retry.status).toBe(200);
    expect(retry.body.lockVersion).toBe(3);
  });

  it('when three tablets complete one run step at once, then exactly one completion is recorded and audited, and the others get 409', async () => {
    const run = await freshRun(engineers[0] as SignedIn, 2);
    await startStep(operators[0] as SignedIn, run.id, 'plasma-1');
    const completions = await Promise.all(
      operators.map((who, i) => post(who, `/api/runs/${run.id}/steps/plasma-1/complete`, { note: `Tablet ${i}` }, newKey())),
    );
    const { won, refused } = byStatus(completions);
    expect(won).toHaveLength(1);
    expect(refused.map((r) => r.status)).toEqual([409, 409]);
    for (const r of refused) expect(r.body.error.message).toMatch(/already completed by/);
    const record = await RunStepRecordModel.findOne({ where: { runId: run.id, stepId: 'plasma-1' } });
    expect(record?.state).toBe('done');
    expect(record?.note).toBe(won[0]?.body.step.note);
    expect(await AuditEventModel.count({ where: { action: 'run-step.completed', entityId: String(run.id) } })).toBe(1);
  });

  it('when one tablet sends the same completion twice at once (a retry racing its original), then one completion is recorded and neither answer is a server error', async () => {
    const run = await freshRun(engineers[0] as SignedIn, 2);
    await startStep(operators[0] as SignedIn, run.id, 'plasma-1');
    const key = newKey();
    const both = await Promise.all([1, 2].map(() => post(operators[0] as SignedIn, `/api/runs/${run.id}/steps/plasma-1/complete`, { note: 'Once' }, key)));
    for (const r of both) expect(r.status, JSON.stringify(r.body)).toBeLessThan(500);
    expect(both.some((r) => r.status === 200)).toBe(true);
    expect(await AuditEventModel.count({ where: { action: 'run-step.completed', entityId: String(run.id) } })).toBe(1);
  });

  it('when two quality staff sign dispositions of one deviation at once, then one disposition and one signature are kept and the other gets 409 with nothing signed', async () => {
    const run = await freshRun(engineers[0] as SignedIn, 2);
    const id = await reportProblem(operators[0] as SignedIn, run.id, { severity: 'major' });
    const seen = await Promise.all(quality.map((q) => getDetail(q, id)));
    const signs = await Promise.all(
      quality.map((q, i) => disposition(q, id, { contentHash: seen[i]?.contentHash, disposition: i === 0 ? 'use-as-is' : 'scrap', rationale: `Decision ${i}: reviewed the strip under the scope.` })),
    );
    const { won, refused } = byStatus(signs);
    expect(won).toHaveLength(1);
    expect(refused.map((r) => r.status)).toEqual([409]);
    // Which message depends on where the loser was when the winner committed; both say why.
    expect(refused[0]?.body.error.message).toMatch(/nothing was signed|is already dispositioned/);
    const kept = await DeviationDispositionModel.findAll({ where: { deviationId: id } });
    expect(kept).toHaveLength(1);
    expect(kept[0]?.rationale).toBe(won[0]?.body.dispositions[0].rationale);
    expect(await SignatureModel.count({ where: { entityType: 'deviation', entityId: id } })).toBe(1);
  });

  it('when quality changes a deviation’s severity while a colleague signs from the old view, then the signature is refused with 409', async () => {
    const run = await freshRun(engineers[0] as SignedIn, 2);
    const id = await reportProblem(operators[0] as SignedIn, run.id, { severity: 'minor' });
    const [first, second] = quality as [SignedIn, SignedIn];
    const stale = (await getDetail(second, id)).contentHash;
    expect((await assign(first, id, { assigneeId: first.user.id, severity: 'major' })).status).toBe(200);
    const res = await disposition(second, id, { contentHash: stale });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/changed since you opened it; nothing was signed/);
    expect(await DeviationDispositionModel.count({ where: { deviationId: id } })).toBe(0);
    expect((await getDetail(first, id)).severity).toBe('major');
  });
});
