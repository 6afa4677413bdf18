import { Op, type Transaction, type WhereOptions } from 'sequelize';

import type { CatalogueQuery, RecipeInput } from '@tracewright/shared';
import type { RecipeDetail, RecipeSummary, RecipeUpdate } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict, notFound, staleVersion } from '../errors/app-error';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { contentHashOf, emptyContent, peopleNames, recipeRecord, recipeSummary, versionRecord, versionSummary } from './recipe-dto';

const escapeLike = (text: string) => text.replace(/[%_\\]/g, '\\$&');

/** Reads a recipe, optionally locking it: every change to a recipe's versions locks it first. */
export async function loadRecipe(id: number, transaction?: Transaction, lock = false): Promise<RecipeModel> {
  const row = await RecipeModel.findByPk(id, { transaction, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
  if (!row) throw notFound('Recipe', id);
  return row;
}

export async function listRecipes(query: CatalogueQuery): Promise<RecipeSummary[]> {
  const where: WhereOptions = {};
  if (query.archived !== 'all') Object.assign(where, { archived: query.archived === 'true' });
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    Object.assign(where, { [Op.or]: ['code', 'name', 'product'].map((column) => ({ [column]: { [Op.like]: pattern } })) });
  }
  const recipes = await RecipeModel.findAll({ where, order: [['code', 'ASC']] });
  // The list never needs the content: it can be large, and only a version's own page shows it.
  const versions = await RecipeVersionModel.findAll({
    where: { recipeId: { [Op.in]: recipes.map((r) => r.id) } },
    attributes: ['id', 'recipeId', 'number', 'state'],
  });
  return recipes.map((r) => recipeSummary(r, versions.filter((v) => v.recipeId === r.id)));
}

/** The recipe with its versions, newest first. */
export async function getRecipe(id: number, transaction?: Transaction): Promise<RecipeDetail> {
  const recipe = await loadRecipe(id, transaction);
  const versions = await RecipeVersionModel.findAll({
    where: { recipeId: id },
    order: [['number', 'DESC']],
    transaction,
  });
  const people = await peopleNames(versions.flatMap((v) => [v.authorId, v.releasedBy]), transaction);
  return { ...recipeSummary(recipe, versions), versions: versions.map((v) => versionSummary(v, people)) };
}

async function assertCodeFree(code: string, exceptId: number | null, transaction: Transaction) {
  const other = await RecipeModel.findOne({ where: { code }, transaction });
  if (other && other.id !== exceptId) throw conflict(`Recipe code ${code} is already used by “${other.name}”. Pick another code.`);
}

/** Creates the recipe and its first version: an empty draft the author fills in. */
export async function createRecipe(ctx: AppContext, actor: UserModel, input: RecipeInput): Promise<RecipeDetail> {
  const id = await ctx.sequelize.transaction(async (transaction) => {
    await assertCodeFree(input.code, null, transaction);
    const recipe = await RecipeModel.create({ ...input, createdBy: actor.id }, { transaction });
    const content = emptyContent();
    const draft = await RecipeVersionModel.create(
      { recipeId: recipe.id, number: 1, state: 'draft', content, contentHash: contentHashOf(content), authorId: actor.id },
      { transaction },
    );
    const audit = (action: string, entityType: string, entityId: number, after: object) =>
      recordAudit(ctx, { actorId: actor.id, action, entityType, entityId, after }, transaction);
    await audit('recipe.created', 'recipe', recipe.id, recipeRecord(recipe));
    await audit('recipe-version.created', 'recipe-version', draft.id, versionRecord(draft));
    return recipe.id;
  });
  return getRecipe(id);
}

/** Code, names and notes; `version` must be the one the person loaded (stale → 409). */
export async function updateRecipe(ctx: AppContext, actor: UserModel, id: number, input: RecipeUpdate): Promise<RecipeDetail> {
  await ctx.sequelize.transaction(async (transaction) => {
    const recipe = await loadRecipe(id, transaction, true);
    if (recipe.version !== input.version) throw staleVersion('recipe', recipe.version);
    await assertCodeFree(input.code, recipe.id, transaction);
    const before = recipeRecord(recipe);
    const { version: _read, ...changes } = input;
    await recipe.update({ ...changes, version: recipe.version + 1 }, { transaction });
    await recordAudit(ctx, { actorId: actor.id, action: 'recipe.updated', entityType: 'recipe', entityId: id, before, after: recipeRecord(recipe) }, transaction);
  });
  return getRecipe(id);
}
