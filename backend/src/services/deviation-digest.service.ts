import { QueryTypes } from 'sequelize';

import { ageDays, DEVIATION_SEVERITIES, DEVIATION_STATES, type DeviationDigestResult } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { AppError } from '../errors/app-error';
import { recordAudit } from './audit.service';
import { qualityAddresses } from './deviation-notifications';
import { deviationDigestMail } from './quality-mail-templates';
import { getLabSettings } from './settings.service';

/** The digest lists this many deviations by name; the counts cover every one. */
const DIGEST_LINES = 25;

async function openCounts(ctx: AppContext) {
  const rows = await ctx.sequelize.query<{ severity: string; state: string; n: number | string }>(
    "SELECT severity, state, COUNT(*) AS n FROM deviations WHERE state <> 'closed' GROUP BY severity, state",
    { type: QueryTypes.SELECT },
  );
  const bySeverity: Record<string, number> = {};
  const byState: Record<string, number> = {};
  for (const s of DEVIATION_SEVERITIES) bySeverity[s] = 0;
  for (const s of DEVIATION_STATES.filter((s) => s !== 'closed')) byState[s] = 0;
  for (const row of rows) {
    bySeverity[row.severity] = (bySeverity[row.severity] ?? 0) + Number(row.n);
    byState[row.state] = (byState[row.state] ?? 0) + Number(row.n);
  }
  return { bySeverity, byState, total: Object.values(bySeverity).reduce((a, b) => a + b, 0) };
}

async function mostPressing(ctx: AppContext) {
  const rows = await ctx.sequelize.query<{ id: number; severity: string; state: string; title: string; run_code: string; created_at: Date }>(
    `SELECT d.id, d.severity, d.state, d.title, r.code AS run_code, d.created_at FROM deviations d JOIN runs r ON r.id = d.run_id
     WHERE d.state <> 'closed' ORDER BY FIELD(d.severity, 'critical', 'major', 'minor'), d.created_at ASC, d.id ASC LIMIT ${DIGEST_LINES}`,
    { type: QueryTypes.SELECT },
  );
  const now = ctx.clock.now();
  return rows.map((r) => ({ id: r.id, severity: r.severity, state: r.state, title: r.title, runCode: r.run_code, ageDays: ageDays(new Date(r.created_at), now) }));
}

/**
 * The daily digest of deviations not yet closed, mailed to every active quality person: counts
 * by severity and state, then the most pressing by name. Nothing is sent when nothing is open.
 * Run by the admin/quality route or the send-deviation-digest command (e.g. daily from cron).
 */
export async function sendDeviationDigest(ctx: AppContext, actorId: number | null): Promise<DeviationDigestResult> {
  const [to, counts] = await Promise.all([qualityAddresses(), openCounts(ctx)]);
  if (to.length === 0 || counts.total === 0) return { sent: false, recipients: to.length, openDeviations: counts.total };
  const [lines, settings] = await Promise.all([mostPressing(ctx), getLabSettings()]);
  const mail = deviationDigestMail({ to, labName: settings.labName, ...counts, lines, link: `${ctx.env.PUBLIC_URL}/deviations` });
  try {
    await ctx.mailer.send(mail);
  } catch {
    throw new AppError(503, 'SERVICE_UNAVAILABLE', 'The mail server did not accept the deviation digest, so it was not sent. Try again in a few minutes.');
  }
  const result = { sent: true, recipients: to.length, openDeviations: counts.total };
  await recordAudit(ctx, { actorId, action: 'deviation.digest-sent', entityType: 'deviation-digest', entityId: null, after: { ...result, bySeverity: counts.bySeverity } });
  return result;
}
