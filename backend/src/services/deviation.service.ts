import type { Transaction } from 'sequelize';

import type { DeviationDraft, DeviationRule, DeviationSummary, StepKind } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { DeviationModel } from '../models/deviation.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RunModel } from '../models/run.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { notifyDeviationRaised } from './deviation-notifications';
import { addDeviationEvent } from './deviation-record';
import { versionContent } from './recipe-dto';
import { toDeviationSummary } from './run-dto';

/** Where a deviation comes from: its step, pieces, photos, and the record that raised it. */
export interface DeviationOrigin {
  stepId?: string | null;
  pieceIds?: readonly number[];
  photoFileIds?: readonly number[];
  /** e.g. { type: 'reading', id: 12 }: review opens that record. */
  source?: { type: string; id: number } | null;
}

/** Major and critical deviations are mailed to quality as soon as they are committed. */
const NOTIFIED: readonly DeviationSummary['severity'][] = ['major', 'critical'];

/** The run's recipe, and the kind of the step in the run's version: the queue filters on both. */
async function queueKeys(runId: number, stepId: string | null, transaction: Transaction): Promise<{ recipeId: number; stepKind: StepKind | null }> {
  const run = await RunModel.findByPk(runId, { attributes: ['id', 'recipeId', 'versionId'], transaction });
  if (!run) throw new Error(`Run ${runId} vanished while raising a deviation.`);
  if (stepId === null) return { recipeId: run.recipeId, stepKind: null };
  const version = await RecipeVersionModel.findByPk(run.versionId, { attributes: ['id', 'content'], transaction });
  const step = version ? versionContent(version).steps.find((s) => s.id === stepId) : undefined;
  return { recipeId: run.recipeId, stepKind: step?.kind ?? null };
}

/**
 * Opens a deviation from a shared draft (deviationDraft), in the caller's transaction with its
 * audit row and first history line: the change that broke the rule and the deviation it raised
 * land together or not at all. A major or critical one is mailed to every active quality person
 * after the commit (never before: a rolled-back write must not announce anything).
 */
export async function raiseDeviation(
  ctx: AppContext,
  actor: UserModel,
  runId: number,
  draft: DeviationDraft,
  origin: DeviationOrigin,
  transaction: Transaction,
): Promise<DeviationSummary> {
  const now = ctx.clock.now();
  const stepId = origin.stepId ?? null;
  const row = await DeviationModel.create(
    {
      runId,
      ...(await queueKeys(runId, stepId, transaction)),
      stepId,
      rule: draft.rule,
      severity: draft.severity,
      title: draft.title,
      expected: draft.expected,
      actual: draft.actual,
      pieceIds: [...(origin.pieceIds ?? [])],
      photoFileIds: [...(origin.photoFileIds ?? [])],
      sourceType: origin.source?.type ?? null,
      sourceId: origin.source?.id ?? null,
      createdBy: actor.id,
      createdAt: now,
      updatedAt: now,
    },
    { transaction },
  );
  const summary = toDeviationSummary(row, new Map([[actor.id, actor.name]]));
  await recordAudit(ctx, { actorId: actor.id, action: 'deviation.raised', entityType: 'deviation', entityId: row.id, after: { ...summary, source: origin.source ?? null } }, transaction);
  await addDeviationEvent(ctx, { deviationId: row.id, kind: 'created', text: row.title, byId: actor.id }, transaction);
  if (NOTIFIED.includes(summary.severity)) transaction.afterCommit(() => notifyDeviationRaised(ctx, summary, actor));
  return summary;
}

/** Whether the run already has a deviation of this rule for this record (one per overdue meter, not one per reading). */
export async function hasDeviationFor(runId: number, rule: DeviationRule, source: { type: string; id: number }, transaction: Transaction): Promise<boolean> {
  const count = await DeviationModel.count({ where: { runId, rule, sourceType: source.type, sourceId: source.id }, transaction });
  return count > 0;
}
