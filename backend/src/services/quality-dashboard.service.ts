import { QueryTypes, type Transaction } from 'sequelize';

import { DEVIATION_SEVERITIES, type QualityDashboard, type QualityWaiting } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { lowCapabilitySpecs } from './quality-capability';

const DAY_MS = 86_400_000;
const n = (value: number | string | null | undefined) => Number(value ?? 0);

/** Deviations not yet closed (review, disposition or verification still needs someone), by severity and age. */
async function openDeviations(ctx: AppContext): Promise<Pick<QualityDashboard, 'openBySeverity' | 'openByAge'>> {
  const now = ctx.clock.now().getTime();
  const [bySeverity, [ages]] = await Promise.all([
    ctx.sequelize.query<{ severity: string; count: number }>("SELECT severity, COUNT(*) AS count FROM deviations WHERE state <> 'closed' GROUP BY severity", { type: QueryTypes.SELECT }),
    ctx.sequelize.query<{ underDay: string; underWeek: string; older: string }>(
      `SELECT SUM(created_at > :day) AS underDay, SUM(created_at <= :day AND created_at > :week) AS underWeek, SUM(created_at <= :week) AS older
       FROM deviations WHERE state <> 'closed'`,
      { replacements: { day: new Date(now - DAY_MS), week: new Date(now - 7 * DAY_MS) }, type: QueryTypes.SELECT },
    ),
  ]);
  const openBySeverity: Record<string, number> = Object.fromEntries(DEVIATION_SEVERITIES.map((s) => [s, 0]));
  for (const row of bySeverity) openBySeverity[row.severity] = n(row.count);
  return { openBySeverity, openByAge: { underDay: n(ages?.underDay), underWeek: n(ages?.underWeek), older: n(ages?.older) } };
}

/** Completed runs waiting for quality's sign-off, longest waiting first, with their undecided deviations. */
async function runsAwaitingSignOff(ctx: AppContext): Promise<QualityDashboard['runsAwaitingSignOff']> {
  const rows = await ctx.sequelize.query<{ id: number; code: string; recipe_code: string; completed_at: Date | null; undecided: number | string }>(
    `SELECT r.id, r.code, rc.code AS recipe_code,
       (SELECT MAX(s.completed_at) FROM run_step_records s WHERE s.run_id = r.id) AS completed_at,
       (SELECT COUNT(*) FROM deviations d WHERE d.run_id = r.id AND d.state IN ('open', 'in-review')) AS undecided
     FROM runs r JOIN recipes rc ON rc.id = r.recipe_id
     WHERE r.state = 'completed' ORDER BY completed_at ASC, r.id ASC LIMIT 100`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ id: r.id, code: r.code, recipeCode: r.recipe_code, completedAt: r.completed_at ? new Date(r.completed_at).toISOString() : null, openDeviations: n(r.undecided) }));
}

async function versionsAwaitingReview(ctx: AppContext): Promise<QualityDashboard['versionsAwaitingReview']> {
  const rows = await ctx.sequelize.query<{ id: number; recipe_id: number; recipe_code: string; number: number; submitted_at: Date | null }>(
    `SELECT v.id, v.recipe_id, r.code AS recipe_code, v.number, v.submitted_at FROM recipe_versions v JOIN recipes r ON r.id = v.recipe_id
     WHERE v.state = 'in-review' ORDER BY v.submitted_at ASC, v.id ASC LIMIT 100`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((v) => ({ id: v.id, recipeId: v.recipe_id, recipeCode: v.recipe_code, number: v.number, submittedAt: v.submitted_at ? new Date(v.submitted_at).toISOString() : null }));
}

/** GET /api/quality/dashboard: what waits for a quality decision today, and which specs are not capable. */
export async function getQualityDashboard(ctx: AppContext): Promise<QualityDashboard> {
  const [open, runs, versions, lowCapability] = await Promise.all([openDeviations(ctx), runsAwaitingSignOff(ctx), versionsAwaitingReview(ctx), lowCapabilitySpecs(ctx)]);
  return { ...open, runsAwaitingSignOff: runs, versionsAwaitingReview: versions, lowCapability };
}

/**
 * GET /api/quality/waiting: the overview's three queues counted, in one statement and without the
 * capability figures (those read every reading), for a page opened many times a day.
 */
export async function getQualityWaiting(ctx: AppContext, transaction?: Transaction): Promise<QualityWaiting> {
  const [row] = await ctx.sequelize.query<{ deviations: number | string; runs: number | string; versions: number | string }>(
    `SELECT (SELECT COUNT(*) FROM deviations WHERE state <> 'closed') AS deviations,
       (SELECT COUNT(*) FROM runs WHERE state = 'completed') AS runs,
       (SELECT COUNT(*) FROM recipe_versions WHERE state = 'in-review') AS versions`,
    { type: QueryTypes.SELECT, transaction },
  );
  return { deviationsNotClosed: n(row?.deviations), runsAwaitingSignOff: n(row?.runs), versionsAwaitingReview: n(row?.versions) };
}
