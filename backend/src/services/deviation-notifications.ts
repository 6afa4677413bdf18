import type { DeviationSummary } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { RecipeModel } from '../models/recipe.model';
import { RunModel } from '../models/run.model';
import { UserModel } from '../models/user.model';
import { problemReportedMail } from './mail-templates';
import { deviationRaisedMail } from './quality-mail-templates';

/** Addresses of every active quality person, in a stable order. */
export async function qualityAddresses(): Promise<string[]> {
  const people = await UserModel.findAll({ where: { role: 'quality', status: 'active' }, attributes: ['email'], order: [['id', 'ASC']] });
  return people.map((p) => p.email);
}

/**
 * Every active quality person hears of a major or critical deviation, reported by hand or raised
 * by a rule. Called after the commit: when the mail server is down the deviation stands, so a
 * failure is logged, never returned (nor thrown into the commit that already happened).
 */
export async function notifyDeviationRaised(ctx: AppContext, deviation: DeviationSummary, raisedBy: UserModel): Promise<void> {
  try {
    const [run, to] = await Promise.all([RunModel.findByPk(deviation.runId), qualityAddresses()]);
    if (!run || to.length === 0) {
      ctx.logger.warn({ runId: deviation.runId, deviation: deviation.id }, 'no active quality person to tell about a deviation');
      return;
    }
    const recipe = await RecipeModel.findByPk(run.recipeId);
    const link = `${ctx.env.PUBLIC_URL}/deviations/${deviation.id}`;
    const common = { to, runCode: run.code, recipeCode: recipe?.code ?? '' };
    const mail =
      deviation.rule === 'reported'
        ? problemReportedMail({ ...common, severity: deviation.severity, title: deviation.title, description: deviation.actual, reportedBy: raisedBy.name, photoCount: deviation.photoFileIds.length, link: `${ctx.env.PUBLIC_URL}/runs/${run.id}`, deviationLink: link })
        : deviationRaisedMail({ ...common, deviation, raisedBy: raisedBy.name, link });
    await ctx.mailer.send(mail);
  } catch (err) {
    ctx.logger.warn({ err: { message: (err as Error).message }, deviation: deviation.id }, 'deviation mail not sent');
  }
}
