import type { AppContext } from '../app-context';
import type { RecipeVersionModel } from '../models/recipe-version.model';
import type { RecipeModel } from '../models/recipe.model';
import { UserModel } from '../models/user.model';
import { reviewRequestedMail, versionReleasedMail, versionSentBackMail } from './mail-templates';
import type { OutgoingMail } from './mail.service';

// Mail about a version is a courtesy after the change has been committed: when the mail server is
// down the change stands, so a failure is logged rather than turned into an error for the person.
async function deliver(ctx: AppContext, mail: OutgoingMail) {
  try {
    await ctx.mailer.send(mail);
  } catch (err) {
    ctx.logger.warn({ err: { message: (err as Error).message }, subject: mail.subject }, 'recipe mail not sent');
  }
}

const about = (ctx: AppContext, recipe: RecipeModel, version: RecipeVersionModel) => ({
  recipeCode: recipe.code,
  recipeName: recipe.name,
  versionNumber: version.number,
  link: `${ctx.env.PUBLIC_URL}/recipes/${recipe.id}/versions/${version.id}`,
});

const activePeople = (ids: number[]) => UserModel.findAll({ where: { id: [...new Set(ids)], status: 'active' } });

/** Every active quality person hears that a version waits for review. */
export async function notifyReviewRequested(ctx: AppContext, recipe: RecipeModel, version: RecipeVersionModel, submitter: UserModel, warnings: number) {
  const quality = await UserModel.findAll({ where: { role: 'quality', status: 'active' }, attributes: ['email'], order: [['id', 'ASC']] });
  if (quality.length === 0) {
    ctx.logger.warn({ recipe: recipe.code, version: version.number }, 'no active quality person to review the version');
    return;
  }
  await deliver(ctx, reviewRequestedMail({ ...about(ctx, recipe, version), to: quality.map((q) => q.email), submittedBy: submitter.name, warnings }));
}

/** The author hears that their version was released. */
export async function notifyReleased(ctx: AppContext, recipe: RecipeModel, version: RecipeVersionModel, releasedBy: UserModel, retiredNumber: number | null) {
  for (const author of await activePeople([version.authorId])) {
    await deliver(ctx, versionReleasedMail({ ...about(ctx, recipe, version), to: author.email, name: author.name, releasedBy: releasedBy.name, retiredNumber }));
  }
}

/** The author, and whoever submitted it if someone else, hear why it came back. */
export async function notifySentBack(ctx: AppContext, recipe: RecipeModel, version: RecipeVersionModel, submitterId: number | null, sentBackBy: UserModel, comment: string) {
  const ids = submitterId === null ? [version.authorId] : [version.authorId, submitterId];
  for (const person of await activePeople(ids)) {
    await deliver(ctx, versionSentBackMail({ ...about(ctx, recipe, version), to: person.email, name: person.name, sentBackBy: sentBackBy.name, comment }));
  }
}
