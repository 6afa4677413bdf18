import type { Transaction } from 'sequelize';

import { stateInWords, versionDiff, type SaveDraftInput } from '@tracewright/shared';
import type { NewVersionInput, RecipeVersionView, VersionDiffView } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict, notFound, staleVersion, unprocessable } from '../errors/app-error';
import { RecipeVersionModel } from '../models/recipe-version.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { contentHashOf, versionContent, versionRecord, versionRef } from './recipe-dto';
import { assertReferencesExist, loadReferences } from './recipe-references';
import { versionView } from './recipe-version-view';
import { loadRecipe } from './recipe.service';

export async function loadVersion(id: number, transaction?: Transaction, lock = false): Promise<RecipeVersionModel> {
  const row = await RecipeVersionModel.findByPk(id, { transaction, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
  if (!row) throw notFound('Recipe version', id);
  return row;
}

export async function getVersion(id: number): Promise<RecipeVersionView> {
  return versionView(await loadVersion(id));
}

/** Only drafts change; each other state says why not and what to do instead. */
export function assertEditable(row: RecipeVersionModel): void {
  if (row.state === 'draft') return;
  if (row.state === 'in-review') {
    throw conflict(`Version ${row.number} is in review and read-only. Ask quality to send it back if it needs changes.`, { state: row.state });
  }
  throw conflict('Released versions are read-only; make a new version.', { state: row.state });
}

/**
 * Saves a draft's whole content. The lock version must be the one the editor loaded: when another
 * person saved in between, 409 and their content stays as it is.
 */
export async function saveDraft(ctx: AppContext, actor: UserModel, id: number, input: SaveDraftInput): Promise<RecipeVersionView> {
  const { lockVersion, ...content } = input;
  const saved = await ctx.sequelize.transaction(async (transaction) => {
    const row = await loadVersion(id, transaction, true);
    assertEditable(row);
    if (row.lockVersion !== lockVersion) throw staleVersion('draft', row.lockVersion);
    assertReferencesExist(content, await loadReferences(content, transaction));
    const before = versionRecord(row);
    await row.update({ content, contentHash: contentHashOf(content), lockVersion: row.lockVersion + 1 }, { transaction });
    await recordAudit(ctx, { actorId: actor.id, action: 'recipe-version.saved', entityType: 'recipe-version', entityId: id, before, after: versionRecord(row) }, transaction);
    return row;
  });
  return versionView(saved);
}

/**
 * Starts the next version as a draft copied from `fromVersionId`, or from the released version
 * (the latest version when none was released). One open version (draft or in review) at a time.
 */
export async function startNewVersion(ctx: AppContext, actor: UserModel, recipeId: number, input: NewVersionInput): Promise<RecipeVersionView> {
  const created = await ctx.sequelize.transaction(async (transaction) => {
    const recipe = await loadRecipe(recipeId, transaction, true);
    const versions = await RecipeVersionModel.findAll({ where: { recipeId }, order: [['number', 'DESC']], transaction });
    const open = versions.find((v) => v.state === 'draft' || v.state === 'in-review');
    if (open) {
      throw conflict(`${recipe.code} already has version ${open.number} open (${stateInWords(open.state)}). Finish or release it before starting another.`, { openVersionId: open.id });
    }
    const source = await copySource(versions, input.fromVersionId ?? null, recipe.code);
    const content = { ...versionContent(source), changeNote: '' };
    const draft = await RecipeVersionModel.create(
      { recipeId, number: (versions[0]?.number ?? 0) + 1, state: 'draft', content, contentHash: contentHashOf(content), authorId: actor.id },
      { transaction },
    );
    const after = { ...versionRecord(draft), copiedFromVersionId: source.id };
    await recordAudit(ctx, { actorId: actor.id, action: 'recipe-version.created', entityType: 'recipe-version', entityId: draft.id, after }, transaction);
    return draft;
  });
  return versionView(created);
}

async function copySource(versions: RecipeVersionModel[], fromVersionId: number | null, code: string): Promise<RecipeVersionModel> {
  if (fromVersionId === null) {
    const source = versions.find((v) => v.state === 'released') ?? versions[0];
    if (!source) throw notFound(`A version of ${code}`);
    return source;
  }
  const source = versions.find((v) => v.id === fromVersionId);
  if (source) return source;
  await loadVersion(fromVersionId);
  throw unprocessable(`Version ${fromVersionId} belongs to another recipe; copy a version of ${code}.`, {
    formErrors: [],
    fieldErrors: { fromVersionId: [`Version ${fromVersionId} is not a version of ${code}.`] },
  });
}

/** What changed from version `againstId` to version `id`; both must belong to one recipe. */
export async function diffVersions(id: number, againstId: number): Promise<VersionDiffView> {
  const [to, from] = await Promise.all([loadVersion(id), loadVersion(againstId)]);
  if (to.recipeId !== from.recipeId) {
    throw unprocessable(`Versions ${id} and ${againstId} belong to different recipes; compare versions of one recipe.`);
  }
  return { from: versionRef(from), to: versionRef(to), diff: versionDiff(versionContent(from), versionContent(to)) };
}
