import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { RecipeVersionViewSchema } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { SignatureModel } from '../models/signature.model';
import { SubstrateModel } from '../models/substrate.model';
import { UserModel } from '../models/user.model';
import { signedInUser, TEST_PASSWORD, type SignedIn } from '../../test/fixtures';
import { createProcessRecords, createRecipe, passingContent, saveDraft, write, type ProcessRecords } from '../../test/recipe-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let quality: SignedIn;
let operator: SignedIn;
let records: ProcessRecords;
beforeAll(async () => {
  t = await createTestContext();
  [engineer, quality, operator] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'operator')]);
  records = await createProcessRecords();
});
afterAll(() => t.close());

const SIGN = { password: TEST_PASSWORD, meaning: 'approved for production' };
const submit = (who: SignedIn, id: number) => write(who, 'post', `/api/recipe-versions/${id}/submit`);
const release = (who: SignedIn, id: number, body: object = SIGN) => write(who, 'post', `/api/recipe-versions/${id}/release`, body);
const stateOf = async (id: number) => (await RecipeVersionModel.findByPk(id))?.state;
const signaturesOf = (id: number) => SignatureModel.count({ where: { entityType: 'recipe-version', entityId: id } });

/** A recipe whose v1 holds passing content and waits in review. */
async function versionInReview(author = engineer) {
  const created = await createRecipe(author);
  await saveDraft(author, created.draftId, passingContent(records));
  expect((await submit(author, created.draftId)).status).toBe(200);
  return created;
}

describe('review and release of recipe versions', () => {
  it('when a version goes through its whole life, then it is submitted, signed, released, read-only, copied, and retired by the next release', async () => {
    const { recipeId, draftId: v1, code } = await createRecipe(engineer);
    await saveDraft(engineer, v1, passingContent(records));

    const submitted = await submit(engineer, v1);
    expect(submitted.status).toBe(200);
    expect(submitted.body).toMatchObject({ state: 'in-review', submittedBy: { id: engineer.user.id } });
    const link = `http://tablet.lab.example:8080/recipes/${recipeId}/versions/${v1}`;
    const reviewMail = await t.smtp.waitFor((m) => m.to.includes(quality.user.email) && m.subject.includes(code));
    expect(reviewMail.subject).toMatch(/Review requested/);
    expect(reviewMail.text).toContain(link);

    const released = await release(quality, v1);
    expect(released.status, JSON.stringify(released.body)).toBe(200);
    const view = RecipeVersionViewSchema.parse(released.body);
    expect(view).toMatchObject({ state: 'released', releasedBy: { id: quality.user.id } });
    expect(view.signature).toMatchObject({ userId: quality.user.id, printedName: quality.user.name, meaning: 'approved for production', entityType: 'recipe-version', entityId: v1, contentHash: view.contentHash });
    const authorMail = await t.smtp.waitFor((m) => m.to.includes(engineer.user.email) && m.subject.startsWith('Released') && m.subject.includes(code));
    expect(authorMail.text).toContain(link);

    const edit = await write(engineer, 'put', `/api/recipe-versions/${v1}`, { ...passingContent(records), lockVersion: view.lockVersion });
    expect(edit.status).toBe(409);
    expect(edit.body.error.message).toBe('Released versions are read-only; make a new version.');

    const next = await write(engineer, 'post', `/api/recipes/${recipeId}/versions`);
    expect(next.status).toBe(201);
    expect(next.body).toMatchObject({ number: 2, state: 'draft' });
    expect(next.body.content.steps).toEqual(view.content.steps);
    await saveDraft(engineer, next.body.id, passingContent(records, { cureMinutes: 240, changeNote: 'Longer cure' }));
    expect((await submit(engineer, next.body.id)).status).toBe(200);
    const second = await release(quality, next.body.id);
    expect(second.status).toBe(200);

    const v1Row = await RecipeVersionModel.findByPk(v1);
    expect(v1Row).toMatchObject({ state: 'retired', contentHash: view.contentHash });
    expect(v1Row?.retiredAt).toBeInstanceOf(Date);
    const recipe = await operator.agent.get(`/api/recipes/${recipeId}`);
    expect(recipe.body).toMatchObject({ releasedVersion: { number: 2 }, latestVersion: { number: 2, state: 'released' } });
    expect(recipe.body.versions.map((v: { number: number; state: string }) => `${v.number}:${v.state}`)).toEqual(['2:released', '1:retired']);
    const v1View = await operator.agent.get(`/api/recipe-versions/${v1}`);
    expect(v1View.body.signature.contentHash).toBe(view.contentHash);
    const actions = (await AuditEventModel.findAll({ where: { entityType: 'recipe-version', entityId: String(v1) }, order: [['id', 'ASC']] })).map((a) => a.action);
    expect(actions).toEqual(['recipe-version.created', 'recipe-version.saved', 'recipe-version.submitted', 'recipe-version.released', 'recipe-version.retired']);
    // The database itself keeps released content as it was signed.
    await expect(RecipeVersionModel.update({ contentHash: 'f'.repeat(64) }, { where: { id: next.body.id } })).rejects.toThrow(/read-only/);
  });

  it('when the author of a version has become quality, then they may not approve it (403) and nothing is signed', async () => {
    const author = await signedInUser(t.app, 'engineer');
    const { draftId } = await versionInReview(author);
    await UserModel.update({ role: 'quality' }, { where: { id: author.user.id } });
    const res = await release(author, draftId);
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/author may not approve their own version/);
    expect(await stateOf(draftId)).toBe('in-review');
    expect(await signaturesOf(draftId)).toBe(0);
  });

  it('when someone who edited the draft has become quality, then they may not approve it either', async () => {
    const editor = await signedInUser(t.app, 'engineer');
    const { draftId } = await createRecipe(engineer);
    await saveDraft(editor, draftId, passingContent(records));
    expect((await submit(engineer, draftId)).status).toBe(200);
    await UserModel.update({ role: 'quality' }, { where: { id: editor.user.id } });
    const res = await release(editor, draftId);
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/You edited or submitted version 1/);
  });

  it('when the password is wrong, then the release is refused with 401, the attempt is audited, and nothing changes', async () => {
    const { draftId } = await versionInReview();
    const res = await release(quality, draftId, { ...SIGN, password: 'not-my-password' });
    expect(res.status).toBe(401);
    expect(res.body.error.message).toMatch(/password is not right, so nothing was signed/);
    expect(res.body.error.details.fieldErrors.password).toHaveLength(1);
    const refused = await AuditEventModel.findOne({ where: { action: 'signature.refused', entityId: String(draftId) } });
    expect(refused).toMatchObject({ actorId: quality.user.id, entityType: 'recipe-version' });
    expect(refused?.afterJson).toMatchObject({ meaning: 'approved for production', reason: 'wrong password' });
    expect(await stateOf(draftId)).toBe('in-review');
    expect(await signaturesOf(draftId)).toBe(0);
  });

  it('when quality sends a version back with a comment, then it is a draft again with the comment, and the author is told', async () => {
    const { draftId, code } = await versionInReview();
    expect((await write(quality, 'post', `/api/recipe-versions/${draftId}/send-back`, {})).status).toBe(400);
    expect(await stateOf(draftId)).toBe('in-review');
    const comment = 'Add the nozzle check before the silver pass.';
    const res = await write(quality, 'post', `/api/recipe-versions/${draftId}/send-back`, { comment });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ state: 'draft', reviewComment: comment, submittedBy: null });
    const mail = await t.smtp.waitFor((m) => m.to.includes(engineer.user.email) && m.subject.startsWith('Sent back') && m.subject.includes(code));
    expect(mail.text).toContain(comment);
    expect(await AuditEventModel.count({ where: { action: 'recipe-version.sent-back', entityId: String(draftId), reason: comment } })).toBe(1);
    // Back in draft, the author can change it again.
    await saveDraft(engineer, draftId, passingContent(records, { changeNote: 'Nozzle check added' }));
  });

  it('when a check blocks, then submit answers 422 with the checks and the version stays a draft', async () => {
    const { draftId } = await createRecipe(engineer);
    await saveDraft(engineer, draftId, passingContent(records, { cureMinutes: 20 }));
    const res = await submit(engineer, draftId);
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/cannot be submitted: 1 process check blocks it/);
    const blocked = res.body.error.details.checks.filter((c: { status: string }) => c.status === 'blocked');
    expect(blocked.map((c: { family: string }) => c.family)).toEqual(['cure-dose']);
    expect(res.body.error.details.summary).toMatchObject({ isBlocked: true, blocked: 1 });
    expect(await stateOf(draftId)).toBe('draft');
  });

  it('when a record changes after submission so that a check blocks, then release answers 422 with the checks and nothing is signed', async () => {
    const own = await createProcessRecords();
    const { draftId } = await createRecipe(engineer);
    await saveDraft(engineer, draftId, passingContent(own));
    expect((await submit(engineer, draftId)).status).toBe(200);
    // The film turns out to survive far less heat than recorded: the 110 °C cure now blocks.
    await SubstrateModel.update({ maxContinuousTempC: 80, maxShortExposureTempC: 90 }, { where: { id: own.substrateId } });
    const res = await release(quality, draftId);
    expect(res.status).toBe(422);
    expect(res.body.error.details.checks.some((c: { family: string; status: string }) => c.family === 'heat' && c.status === 'blocked')).toBe(true);
    expect(await stateOf(draftId)).toBe('in-review');
    expect(await signaturesOf(draftId)).toBe(0);
  });

  it('when the wrong role or state is used, then 403 or 409 and nothing changes', async () => {
    const { draftId } = await createRecipe(engineer);
    await saveDraft(engineer, draftId, passingContent(records));
    expect((await release(quality, draftId)).status).toBe(409);
    expect((await release(engineer, draftId)).status).toBe(403);
    expect((await release(operator, draftId)).status).toBe(403);
    expect((await submit(quality, draftId)).status).toBe(403);
    expect((await submit(engineer, draftId)).status).toBe(200);
    expect((await submit(engineer, draftId)).status).toBe(409);
    const edit = await write(engineer, 'put', `/api/recipe-versions/${draftId}`, { ...passingContent(records), lockVersion: 99 });
    expect(edit.status).toBe(409);
    expect(edit.body.error.message).toMatch(/in review and read-only/);
    expect((await release(quality, draftId, { ...SIGN, meaning: 'looks fine' })).status).toBe(400);
    expect((await release(quality, draftId, { ...SIGN, contentHash: '0'.repeat(64) })).status).toBe(409);
    expect(await stateOf(draftId)).toBe('in-review');
    expect(await signaturesOf(draftId)).toBe(0);
  });
});

describe('brakes on signature passwords', () => {
  it('when a signer keeps entering wrong passwords, then past the limit the release answers 429 without checking', async () => {
    const strict = await createTestContext({ SIGN_IN_LIMIT: '2' });
    try {
      const { draftId } = await versionInReview();
      const signer = await signedInUser(strict.app, 'quality');
      const attempt = (password: string) => signer.agent.post(`/api/recipe-versions/${draftId}/release`).set('X-CSRF-Token', signer.csrf).send({ ...SIGN, password });
      expect((await attempt('wrong-1')).status).toBe(401);
      expect((await attempt('wrong-2')).status).toBe(401);
      const braked = await attempt(TEST_PASSWORD);
      expect(braked.status).toBe(429);
      expect(braked.body.error.message).toMatch(/Too many refused signatures/);
      expect(await AuditEventModel.count({ where: { action: 'signature.refused', entityId: String(draftId) } })).toBe(2);
      expect(await stateOf(draftId)).toBe('in-review');
    } finally {
      await strict.close();
    }
  });
});
