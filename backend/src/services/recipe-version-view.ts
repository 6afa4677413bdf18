import { checkSummary, derivedSafetyNotes, recipeChecks, recipeTimeline, type DraftContent } from '@tracewright/shared';
import type { RecipeVersionView } from '@tracewright/shared';

import { notFound } from '../errors/app-error';
import type { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import { SignatureModel } from '../models/signature.model';
import { peopleNames, personRef, toSignatureDto, versionContent, versionSummary } from './recipe-dto';
import { checkInputOf, loadReferences, type LoadedReferences } from './recipe-references';

/** Everything the server computes from a version's content with the records it names. */
export function evaluateContent(content: DraftContent, loaded: LoadedReferences) {
  const checks = recipeChecks(checkInputOf(content, loaded));
  const context = { inks: loaded.inks, heatSources: loaded.heatSources };
  return {
    checks,
    summary: checkSummary(checks),
    timeline: recipeTimeline(content.steps),
    safetyNotes: content.steps.map((step) => ({ stepId: step.id, notes: derivedSafetyNotes(step, context) })),
  };
}

/** The signature that released this version (retired versions keep theirs). */
export const releaseSignatureOf = (versionId: number) =>
  SignatureModel.findOne({ where: { entityType: 'recipe-version', entityId: versionId }, order: [['id', 'DESC']] });

/** GET /api/recipe-versions/:id: the content, its state and people, and the live checks. */
export async function versionView(row: RecipeVersionModel): Promise<RecipeVersionView> {
  const content = versionContent(row);
  const isSigned = row.state === 'released' || row.state === 'retired';
  const [recipe, loaded, signature, people] = await Promise.all([
    RecipeModel.findByPk(row.recipeId),
    loadReferences(content),
    isSigned ? releaseSignatureOf(row.id) : null,
    peopleNames([row.authorId, row.submittedBy, row.releasedBy]),
  ]);
  if (!recipe) throw notFound('Recipe', row.recipeId);
  return {
    ...versionSummary(row, people),
    recipeId: recipe.id,
    recipe: { id: recipe.id, code: recipe.code, name: recipe.name, product: recipe.product },
    content,
    lockVersion: row.lockVersion,
    submittedBy: personRef(people, row.submittedBy),
    signature: signature ? toSignatureDto(signature) : null,
    ...evaluateContent(content, loaded),
  };
}
