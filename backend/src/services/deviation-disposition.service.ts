import type { Transaction } from 'sequelize';

import { deviationStateAfter, dispositionCoverage, dispositionIssues, DISPOSITION_LABELS, QUALITY_SIGNATURE_MEANINGS } from '@tracewright/shared';
import type { DeviationDetail, DispositionInput, FieldIssue, PieceCoverage } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { notFound, unprocessable } from '../errors/app-error';
import { DeviationDispositionModel } from '../models/deviation-disposition.model';
import type { DeviationModel } from '../models/deviation.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RunPieceModel } from '../models/run-piece.model';
import { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { parseJsonColumn } from './catalogue-dto';
import { getDeviation } from './deviation-detail.service';
import { addDeviationEvent, assertDeviationAllows, changeDeviation, deviationRecord, dispositionsOf, loadDeviation } from './deviation-record';
import { openReworkRun } from './deviation-rework';
import { assertUnchangedWhileSigning, confirmDeviationSigner } from './deviation-signing';
import { labToday } from './lab-calendar';
import { versionContent } from './recipe-dto';
import { loadRun } from './run-content';
import { recordSignature } from './signature.service';

/** 422 with every field at fault, in the shape forms show beside their fields. */
function refuse(issues: readonly FieldIssue[]): never {
  const fieldErrors: Record<string, string[]> = {};
  for (const issue of issues) (fieldErrors[issue.field] ??= []).push(issue.message);
  throw unprocessable(issues.map((i) => i.message).join(' '), { formErrors: [], fieldErrors });
}

/** What the disposition would decide, checked against the shared rules; refused with 422 when wrong. */
async function planDisposition(row: DeviationModel, input: DispositionInput, transaction?: Transaction) {
  const run = await loadRun(row.runId, transaction);
  const [version, runPieces, earlier] = await Promise.all([
    RecipeVersionModel.findByPk(run.versionId, { attributes: ['id', 'content'], transaction }),
    RunPieceModel.findAll({ where: { runId: run.id }, attributes: ['id'], transaction }),
    dispositionsOf(row.id, transaction),
  ]);
  if (!version) throw notFound('Recipe version', run.versionId);
  const named = parseJsonColumn<number[]>(row.pieceIds, []);
  const inQuestion = named.length > 0 ? named : runPieces.map((p) => p.id);
  const coverage: PieceCoverage = dispositionCoverage(inQuestion, earlier.flatMap((d) => parseJsonColumn<number[]>(d.pieceIds, [])), input.pieceIds);
  const content = versionContent(version);
  const issues = dispositionIssues(input, { deviationId: row.id, rule: row.rule, sourceType: row.sourceType, coverage, versionStepIds: content.steps.map((s) => s.id) });
  if (input.correctiveAction) {
    const owner = await UserModel.count({ where: { id: input.correctiveAction.ownerId, status: 'active' }, transaction });
    if (owner === 0) issues.push({ field: 'correctiveAction.ownerId', message: 'Pick an active person to own the corrective action.' });
  }
  if (issues.length > 0) refuse(issues);
  return { run, content, coverage };
}

interface SignedPlan extends Awaited<ReturnType<typeof planDisposition>> {
  contentHash: string;
  today: string;
  ip: string | null;
}

/** Inside the signing transaction: the signature, any rework run, the disposition row, the new state, its history line and audit row. */
async function recordDisposition(ctx: AppContext, actor: UserModel, row: DeviationModel, input: DispositionInput, plan: SignedPlan, transaction: Transaction) {
  const { coverage } = plan;
  const signature = await recordSignature(ctx, actor, QUALITY_SIGNATURE_MEANINGS.disposition, { entityType: 'deviation', entityId: row.id, contentHash: plan.contentHash }, transaction);
  const rework =
    input.disposition === 'rework'
      ? await openReworkRun(ctx, actor, { deviation: row, original: plan.run, content: plan.content, pieceIds: coverage.pieceIds, stepIds: input.reworkStepIds, today: plan.today }, transaction)
      : null;
  const action = input.correctiveAction;
  const disposition = await DeviationDispositionModel.create(
    {
      deviationId: row.id,
      disposition: input.disposition,
      rationale: input.rationale,
      pieceIds: coverage.pieceIds,
      reworkStepIds: input.reworkStepIds,
      reworkRunId: rework?.id ?? null,
      correctiveActionNote: action?.note ?? null,
      correctiveActionOwnerId: action?.ownerId ?? null,
      correctiveActionDueOn: action?.dueOn ?? null,
      signatureId: signature.id,
      createdBy: actor.id,
      createdAt: ctx.clock.now(),
    },
    { transaction },
  );
  const before = deviationRecord(row);
  const state = deviationStateAfter(row.state, 'disposition', { isFullyDispositioned: coverage.isComplete });
  await changeDeviation(ctx, row, { state, dispositionedAt: coverage.isComplete ? ctx.clock.now() : null }, transaction);
  const text = `${DISPOSITION_LABELS[input.disposition]} for ${coverage.pieceIds.length} piece(s): ${input.rationale}${rework ? ` Rework run ${rework.code} opened.` : ''}`;
  await addDeviationEvent(ctx, { deviationId: row.id, kind: 'dispositioned', text, byId: actor.id }, transaction);
  const after = { ...deviationRecord(row), disposition: { id: disposition.id, disposition: input.disposition, pieceIds: coverage.pieceIds, reworkRunId: rework?.id ?? null, signatureId: signature.id } };
  await recordAudit(ctx, { actorId: actor.id, action: 'deviation.dispositioned', entityType: 'deviation', entityId: row.id, before, after, reason: input.rationale.slice(0, 1000), ip: plan.ip }, transaction);
}

/**
 * Decides what happens to a deviation's pieces, signed with the person's password over the hash
 * of the deviation as they reviewed it. Rework opens a linked rework run in the same
 * transaction. The deviation is dispositioned once every piece in question has a decision;
 * until then it stays in review.
 */
export async function dispositionDeviation(ctx: AppContext, actor: UserModel, id: number, input: DispositionInput, ip: string | null): Promise<DeviationDetail> {
  const seen = await loadDeviation(id);
  assertDeviationAllows(seen, 'disposition');
  await planDisposition(seen, input);
  const contentHash = await confirmDeviationSigner(ctx, actor, seen, input, QUALITY_SIGNATURE_MEANINGS.disposition, ip);
  const today = await labToday(ctx);
  await ctx.sequelize.transaction(async (transaction) => {
    const row = await loadDeviation(id, transaction, true);
    assertDeviationAllows(row, 'disposition');
    await assertUnchangedWhileSigning(row, contentHash, transaction);
    const plan = await planDisposition(row, input, transaction);
    await recordDisposition(ctx, actor, row, input, { ...plan, contentHash, today, ip }, transaction);
  });
  return getDeviation(ctx, id);
}
