import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { RecipeVersionViewSchema, VersionDiffViewSchema } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { contentHashOf, versionContent } from '../services/recipe-dto';
import { signedInUser, TEST_PASSWORD, type SignedIn } from '../../test/fixtures';
import { createProcessRecords, createRecipe, passingContent, saveDraft, write, type ProcessRecords } from '../../test/recipe-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let engineer2: SignedIn;
let operator: SignedIn;
let quality: SignedIn;
let records: ProcessRecords;
beforeAll(async () => {
  t = await createTestContext();
  [engineer, engineer2, operator, quality] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'engineer'), signedInUser(t.app, 'operator'), signedInUser(t.app, 'quality')]);
  records = await createProcessRecords();
});
afterAll(() => t.close());

const put = (who: SignedIn, id: number, body: object) => write(who, 'put', `/api/recipe-versions/${id}`, body);
const savesOf = (id: number) => AuditEventModel.count({ where: { entityType: 'recipe-version', entityId: String(id), action: 'recipe-version.saved' } });

describe('/api/recipe-versions/:id — reading and saving drafts', () => {
  it('when an engineer saves a draft at its lock version, then content, hash and lock version change and the checks, timeline and safety notes come back', async () => {
    const { draftId, recipeId } = await createRecipe(engineer);
    const res = await put(engineer, draftId, { ...passingContent(records), lockVersion: 1 });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const view = RecipeVersionViewSchema.parse(res.body);
    expect(view).toMatchObject({ id: draftId, recipeId, number: 1, state: 'draft', lockVersion: 2, signature: null });
    expect(view.content.steps.map((s) => s.id)).toEqual(['print-ag-1', 'cure-ag-1', 'inspect-1']);
    expect(view.summary).toMatchObject({ blocked: 0, isBlocked: false });
    expect(view.checks.find((c) => c.id === 'jettability:print-ag-1')?.status).toBe('pass');
    expect(view.timeline.steps.map((s) => s.stepId)).toEqual(['print-ag-1', 'cure-ag-1', 'inspect-1']);
    // The silver ink's ethanol carries H225: the print pass gets its GHS note and the flammable-vapour caution.
    expect(view.safetyNotes[0]?.notes.map((n) => n.code)).toEqual(expect.arrayContaining(['ghs:64-17-5', 'no-ignition']));
    expect(view.safetyNotes[1]?.notes.map((n) => n.code)).toContain('hot-surface');

    const row = await RecipeVersionModel.findByPk(draftId);
    expect(row?.contentHash).toBe(contentHashOf(versionContent(row as RecipeVersionModel)));
    expect(view.contentHash).toBe(row?.contentHash);
    const audit = await AuditEventModel.findOne({ where: { action: 'recipe-version.saved', entityId: String(draftId) } });
    expect(audit?.actorId).toBe(engineer.user.id);
    expect(audit?.beforeJson).toMatchObject({ lockVersion: 1, content: { steps: [] } });
    expect(audit?.afterJson).toMatchObject({ lockVersion: 2, contentHash: row?.contentHash });
    expect((await operator.agent.get(`/api/recipe-versions/${draftId}`)).body).toEqual(res.body);
  });

  it('when two engineers edit one draft and the second saves with a stale lock version, then 409 says nothing was lost and the first one’s content is intact', async () => {
    const { draftId } = await createRecipe(engineer);
    const [mine, theirs] = await Promise.all([engineer.agent.get(`/api/recipe-versions/${draftId}`), engineer2.agent.get(`/api/recipe-versions/${draftId}`)]);
    expect(mine.body.lockVersion).toBe(theirs.body.lockVersion);
    const first = await put(engineer, draftId, { ...passingContent(records, { changeNote: 'Mine' }), lockVersion: mine.body.lockVersion });
    expect(first.status).toBe(200);
    const second = await put(engineer2, draftId, { ...passingContent(records, { changeNote: 'Theirs', cureMinutes: 30 }), lockVersion: theirs.body.lockVersion });
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/Someone else saved this draft first.*Nothing was lost/);
    expect(second.body.error.details).toEqual({ currentVersion: first.body.lockVersion });
    const row = await RecipeVersionModel.findByPk(draftId);
    expect(versionContent(row as RecipeVersionModel).changeNote).toBe('Mine');
    expect(row?.lockVersion).toBe(first.body.lockVersion);
    expect(await savesOf(draftId)).toBe(1);
  });

  it('when the content names an ink that does not exist, then 422 names each field and nothing is written', async () => {
    const { draftId } = await createRecipe(engineer);
    const content = passingContent(records);
    content.steps[0] = { ...content.steps[0], params: { inkId: 2147483000, channel: 'Ag', dpi: 1270, passes: 2 } } as (typeof content.steps)[0];
    const res = await put(engineer, draftId, { ...content, heatSourceIds: [2147483001], lockVersion: 1 });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/The setup: there is no heat source with id 2147483001.*\(and 1 more\)/);
    expect(Object.keys(res.body.error.details.fieldErrors).sort()).toEqual(['heatSourceIds.0', 'steps.0.params.inkId']);
    expect(res.body.error.details.fieldErrors['steps.0.params.inkId'][0]).toMatch(/Step 1 “Print silver traces”: there is no ink with id 2147483000/);
    expect((await RecipeVersionModel.findByPk(draftId))?.lockVersion).toBe(1);
    expect(await savesOf(draftId)).toBe(0);
  });

  const badDrafts: Array<[string, (valid: ReturnType<typeof passingContent>) => unknown]> = [
    ['no lock version', (v) => v],
    ['steps that are not a list', (v) => ({ ...v, steps: 'print', lockVersion: 1 })],
    ['a resolution sent as the text "NaN"', (v) => ({ ...v, steps: [{ ...v.steps[0], params: { ...v.steps[0]?.params, dpi: 'NaN' } }], lockVersion: 1 })],
    ['SQL in a number field', (v) => ({ ...v, substrateId: '1; DELETE FROM recipe_versions', lockVersion: 1 })],
    ['a 20 001-character instruction', (v) => ({ ...v, steps: [{ ...v.steps[0], instructions: 'x'.repeat(20_001) }], lockVersion: 1 })],
    ['two steps with one id', (v) => ({ ...v, steps: [v.steps[0], v.steps[0]], lockVersion: 1 })],
    ['an unknown step kind', (v) => ({ ...v, steps: [{ ...v.steps[0], kind: 'bake' }], lockVersion: 1 })],
  ];
  it.each(badDrafts)('when the draft has %s, then 400 and nothing is written', async (_label, makeBody) => {
    const { draftId } = await createRecipe(engineer);
    const res = await put(engineer, draftId, makeBody(passingContent(records)) as object);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.message.length).toBeGreaterThan(5);
    expect(await savesOf(draftId)).toBe(0);
  });

  it('when a step title holds SQL metacharacters, then it is kept as plain text', async () => {
    const { draftId } = await createRecipe(engineer);
    const content = passingContent(records);
    const title = "Print'); DROP TABLE recipe_versions;-- 100%";
    const view = await saveDraft(engineer, draftId, { ...content, steps: [{ ...content.steps[0], title }, ...content.steps.slice(1)] });
    expect(view.content.steps[0].title).toBe(title);
  });

  it('when an operator tries to save, then 403 and nothing changes', async () => {
    const { draftId } = await createRecipe(engineer);
    expect((await put(operator, draftId, { ...passingContent(records), lockVersion: 1 })).status).toBe(403);
    expect((await RecipeVersionModel.findByPk(draftId))?.lockVersion).toBe(1);
  });

  it('when the version id is unknown, then 404; when it is not a whole number, then 400', async () => {
    expect((await engineer.agent.get('/api/recipe-versions/2147483000')).status).toBe(404);
    expect((await put(engineer, 2147483000, { ...passingContent(records), lockVersion: 1 })).status).toBe(404);
    expect((await engineer.agent.get('/api/recipe-versions/x1')).status).toBe(400);
  });
});

describe('new versions and the diff', () => {
  it('when a draft is still open, then starting another version is refused with 409 and nothing is written', async () => {
    const { recipeId, draftId } = await createRecipe(engineer);
    const res = await write(engineer, 'post', `/api/recipes/${recipeId}/versions`, {});
    expect(res.status).toBe(409);
    expect(res.body.error.details).toEqual({ openVersionId: draftId });
    expect(await RecipeVersionModel.count({ where: { recipeId } })).toBe(1);
  });

  it('when two versions of one recipe are compared, then the diff lists setup and step changes; across recipes 422, unknown 404, no "against" 400', async () => {
    const { recipeId, draftId } = await createRecipe(engineer);
    await saveDraft(engineer, draftId, passingContent(records));
    // A second version may start only once the first is released.
    expect((await write(engineer, 'post', `/api/recipe-versions/${draftId}/submit`)).status).toBe(200);
    expect((await write(quality, 'post', `/api/recipe-versions/${draftId}/release`, { password: TEST_PASSWORD, meaning: 'approved for production' })).status).toBe(200);
    const next = await write(engineer, 'post', `/api/recipes/${recipeId}/versions`, { fromVersionId: draftId });
    expect(next.status, JSON.stringify(next.body)).toBe(201);
    expect(next.body).toMatchObject({ number: 2, state: 'draft', author: { id: engineer.user.id } });
    expect(next.body.content.changeNote).toBe('');
    const content = passingContent(records, { cureMinutes: 240, changeNote: 'Longer cure' });
    await saveDraft(engineer, next.body.id, { ...content, steps: [content.steps[1], content.steps[0], content.steps[2]] });

    const diff = await operator.agent.get(`/api/recipe-versions/${next.body.id}/diff`).query({ against: draftId });
    expect(diff.status, JSON.stringify(diff.body)).toBe(200);
    const view = VersionDiffViewSchema.parse(diff.body);
    expect(view.from).toMatchObject({ id: draftId, number: 1 });
    expect(view.to).toMatchObject({ id: next.body.id, number: 2 });
    expect(view.diff.setupChanges).toEqual([{ path: 'changeNote', before: 'First issue.', after: 'Longer cure' }]);
    const cure = view.diff.steps.find((s) => s.stepId === 'cure-ag-1');
    expect(cure?.changes).toEqual([{ path: 'params.minutes', before: 200, after: 240 }]);

    const other = await createRecipe(engineer);
    expect((await operator.agent.get(`/api/recipe-versions/${next.body.id}/diff`).query({ against: other.draftId })).status).toBe(422);
    expect((await operator.agent.get(`/api/recipe-versions/${next.body.id}/diff`).query({ against: 2147483000 })).status).toBe(404);
    expect((await operator.agent.get(`/api/recipe-versions/${next.body.id}/diff`)).status).toBe(400);
  });
});
