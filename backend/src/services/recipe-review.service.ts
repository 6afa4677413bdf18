import { Op, type Transaction } from 'sequelize';

import { approvalRefusal, versionMoveRefusal, type ProcessCheck, type VersionMove } from '@tracewright/shared';
import type { RecipeVersionView, SendBackInput } from '@tracewright/shared';
import type { ReleaseVersionInput } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict, forbidden, unprocessable } from '../errors/app-error';
import { AuditEventModel } from '../models/audit-event.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { versionContent } from './recipe-dto';
import { notifyReleased, notifyReviewRequested, notifySentBack } from './recipe-notifications';
import { loadReferences } from './recipe-references';
import { evaluateContent, versionView } from './recipe-version-view';
import { loadVersion } from './recipe-version.service';
import { loadRecipe } from './recipe.service';
import { confirmSigner, recordSignature } from './signature.service';

/** A state change as the audit trail keeps it; the content itself does not change here. */
const stateRecord = (row: RecipeVersionModel) => ({
  state: row.state,
  lockVersion: row.lockVersion,
  contentHash: row.contentHash,
  submittedBy: row.submittedBy ?? null,
  releasedBy: row.releasedBy ?? null,
  reviewComment: row.reviewComment ?? null,
});

/** Moves a version on, bumping its lock version so every open editor sees it changed, and audits it. */
async function transition(ctx: AppContext, actor: UserModel, row: RecipeVersionModel, verb: string, changes: Partial<RecipeVersionModel>, transaction: Transaction, reason?: string) {
  const before = stateRecord(row);
  await row.update({ ...changes, lockVersion: row.lockVersion + 1 }, { transaction });
  await recordAudit(ctx, { actorId: actor.id, action: `recipe-version.${verb}`, entityType: 'recipe-version', entityId: row.id, before, after: stateRecord(row), reason }, transaction);
}

/** Recomputes the checks with the records as they are now; anything blocked refuses the step with 422. */
async function assertNotBlocked(row: RecipeVersionModel, doing: 'submitted' | 'released', transaction: Transaction): Promise<ProcessCheck[]> {
  const content = versionContent(row);
  const { checks, summary } = evaluateContent(content, await loadReferences(content, transaction));
  if (!summary.isBlocked) return checks;
  const titles = checks.filter((c) => c.status === 'blocked').map((c) => `“${c.title}”`).join(', ');
  const count = summary.blocked === 1 ? '1 process check blocks it' : `${summary.blocked} process checks block it`;
  throw unprocessable(`Version ${row.number} cannot be ${doing}: ${count} (${titles}). Fix the recipe and try again.`, { checks, summary });
}

function assertState(row: RecipeVersionModel, move: VersionMove) {
  const refusal = versionMoveRefusal(row.state, move, row.number);
  if (refusal) throw conflict(refusal, { state: row.state });
}

/** Separation of duties: the approver must not have created, edited or submitted the version. */
async function assertNotContributor(row: RecipeVersionModel, actor: UserModel) {
  const wrote = await AuditEventModel.findAll({
    attributes: ['actorId'],
    where: { entityType: 'recipe-version', entityId: String(row.id), action: { [Op.in]: ['recipe-version.created', 'recipe-version.saved', 'recipe-version.submitted'] } },
  });
  const refusal = approvalRefusal({ authorId: row.authorId, contributorIds: wrote.map((a) => a.actorId).filter((id): id is number => id !== null) }, actor.id, row.number);
  if (refusal) throw forbidden(refusal);
}

/** Draft → in review, when no check blocks it; every active quality person is told. */
export async function submitVersion(ctx: AppContext, actor: UserModel, id: number): Promise<RecipeVersionView> {
  const { row, warnings } = await ctx.sequelize.transaction(async (transaction) => {
    const version = await loadVersion(id, transaction, true);
    assertState(version, 'submit');
    const checks = await assertNotBlocked(version, 'submitted', transaction);
    await transition(ctx, actor, version, 'submitted', { state: 'in-review', submittedBy: actor.id, submittedAt: ctx.clock.now() }, transaction);
    return { row: version, warnings: checks.filter((c) => c.status === 'warning').length };
  });
  await notifyReviewRequested(ctx, await loadRecipe(row.recipeId), row, actor, warnings);
  return versionView(row);
}

/**
 * In review → released, signed by a quality person with their password; the recipe's previously
 * released version is retired in the same transaction. The author is told.
 */
export async function releaseVersion(ctx: AppContext, actor: UserModel, id: number, input: ReleaseVersionInput, ip: string | null): Promise<RecipeVersionView> {
  const seen = await loadVersion(id);
  assertState(seen, 'release');
  await assertNotContributor(seen, actor);
  const contentHash = input.contentHash ?? seen.contentHash;
  if (contentHash !== seen.contentHash) throw conflict(`Version ${seen.number} changed since you opened it; nothing was signed. Reload and review it again.`);
  await confirmSigner(ctx, actor, input, { entityType: 'recipe-version', entityId: id, contentHash }, ip);
  const { row, retired } = await ctx.sequelize.transaction(async (transaction) => {
    await loadRecipe(seen.recipeId, transaction, true);
    const version = await loadVersion(id, transaction, true);
    if (version.state !== 'in-review' || version.contentHash !== contentHash) {
      throw conflict(`Version ${version.number} changed while you were signing; nothing was signed. Reload and review it again.`);
    }
    await assertNotBlocked(version, 'released', transaction);
    const previous = await RecipeVersionModel.findOne({ where: { recipeId: version.recipeId, state: 'released' }, transaction, lock: transaction.LOCK.UPDATE });
    const now = ctx.clock.now();
    // Retire first: the database allows one released version per recipe at any moment.
    if (previous) await transition(ctx, actor, previous, 'retired', { state: 'retired', retiredAt: now }, transaction);
    await transition(ctx, actor, version, 'released', { state: 'released', releasedBy: actor.id, releasedAt: now }, transaction);
    await recordSignature(ctx, actor, input.meaning, { entityType: 'recipe-version', entityId: id, contentHash }, transaction);
    return { row: version, retired: previous?.number ?? null };
  });
  await notifyReleased(ctx, await loadRecipe(row.recipeId), row, actor, retired);
  return versionView(row);
}

/** In review → draft with the reviewer's comment; the author (and submitter) are told. */
export async function sendBackVersion(ctx: AppContext, actor: UserModel, id: number, input: SendBackInput): Promise<RecipeVersionView> {
  const { row, submitterId } = await ctx.sequelize.transaction(async (transaction) => {
    const version = await loadVersion(id, transaction, true);
    assertState(version, 'send-back');
    const submitter = version.submittedBy ?? null;
    const changes = { state: 'draft' as const, reviewComment: input.comment, submittedBy: null, submittedAt: null };
    await transition(ctx, actor, version, 'sent-back', changes, transaction, input.comment.slice(0, 1000));
    return { row: version, submitterId: submitter };
  });
  await notifySentBack(ctx, await loadRecipe(row.recipeId), row, submitterId, actor, input.comment);
  return versionView(row);
}
