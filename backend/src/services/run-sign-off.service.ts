import { createHash } from 'node:crypto';

import type { Transaction } from 'sequelize';

import { canonicalJson, QUALITY_SIGNATURE_MEANINGS, runSignOffCheck, type RunSignOffView } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict } from '../errors/app-error';
import { DeviationModel } from '../models/deviation.model';
import { RunReadingModel } from '../models/run-reading.model';
import { RunSignOffModel } from '../models/run-sign-off.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import type { RunModel } from '../models/run.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { signatureViews } from './deviation-detail-parts';
import { loadRun } from './run-content';
import { runRecord } from './run-dto';
import { confirmSigner, recordSignature } from './signature.service';

const iso = (d: Date | null | undefined) => d?.toISOString() ?? null;

/**
 * What a sign-off approves: the run, every step record, every reading (corrections included)
 * and where each deviation stands. Its SHA-256 (canonical JSON) is what the signature covers.
 */
async function runState(run: RunModel, transaction?: Transaction) {
  const byRun = { where: { runId: run.id }, order: [['id', 'ASC']] as [string, string][], transaction };
  const [steps, readings, deviations] = await Promise.all([RunStepRecordModel.findAll(byRun), RunReadingModel.findAll(byRun), DeviationModel.findAll(byRun)]);
  const record = {
    run: runRecord(run),
    steps: steps.map((s) => ({ stepId: s.stepId, state: s.state, completedAt: iso(s.completedAt), completedBy: s.completedBy, notDoneReason: s.notDoneReason ?? null })),
    readings: readings.map((r) => ({ id: r.id, specId: r.specId, pieceId: r.pieceId, value: r.value, correctedValue: r.correctedValue, supersededById: r.supersededById ?? null })),
    deviations: deviations.map((d) => ({ id: d.id, state: d.state, revision: d.revision })),
  };
  const contentHash = createHash('sha256').update(canonicalJson(record), 'utf8').digest('hex');
  const check = runSignOffCheck(run, deviations.map((d) => ({ id: d.id, title: d.title, state: d.state })));
  return { contentHash, check };
}

/** GET /api/runs/:id/sign-off: whether the record may be signed off now, its hash, and the signature once given. */
export async function getRunSignOff(id: number): Promise<RunSignOffView> {
  const run = await loadRun(id);
  const [{ contentHash, check }, signOff] = await Promise.all([runState(run), RunSignOffModel.findOne({ where: { runId: id } })]);
  const signature = signOff ? ((await signatureViews([signOff.signatureId])).get(signOff.signatureId) ?? null) : null;
  return { runId: run.id, runCode: run.code, runState: run.state, contentHash, ...check, signature };
}

/**
 * Quality signs a completed run's record off ("run record approved") once every deviation of the
 * run has a disposition; the run is then closed and takes no more records. Refused with 409
 * naming each undecided deviation, or when the record changed since it was reviewed.
 */
export async function signOffRun(ctx: AppContext, actor: UserModel, id: number, input: { password: string; contentHash?: string }, ip: string | null): Promise<RunSignOffView> {
  const seen = await runState(await loadRun(id));
  if (!seen.check.canSignOff) throw conflict(seen.check.refusal ?? 'This run cannot be signed off.', { undecided: seen.check.undecided });
  if (input.contentHash !== undefined && input.contentHash !== seen.contentHash) {
    throw conflict('The run record changed since you opened it; nothing was signed. Reload and review it again.', { contentHash: seen.contentHash });
  }
  const meaning = QUALITY_SIGNATURE_MEANINGS.runSignOff;
  const signed = { entityType: 'run', entityId: id, contentHash: seen.contentHash };
  await confirmSigner(ctx, actor, { password: input.password, meaning }, signed, ip);
  await ctx.sequelize.transaction(async (transaction) => {
    const run = await loadRun(id, transaction, true);
    const now = await runState(run, transaction);
    if (!now.check.canSignOff) throw conflict(now.check.refusal ?? 'This run cannot be signed off.', { undecided: now.check.undecided });
    if (now.contentHash !== seen.contentHash) throw conflict('The run record changed while you were signing; nothing was signed. Reload and review it again.');
    const signature = await recordSignature(ctx, actor, meaning, signed, transaction);
    await RunSignOffModel.create({ runId: id, signatureId: signature.id, signedBy: actor.id, signedAt: signature.signedAt }, { transaction });
    const before = runRecord(run);
    await run.update({ state: 'closed', version: run.version + 1 }, { transaction });
    await recordAudit(ctx, { actorId: actor.id, action: 'run.signed-off', entityType: 'run', entityId: id, before, after: { ...runRecord(run), signatureId: signature.id }, ip }, transaction);
  });
  return getRunSignOff(id);
}
