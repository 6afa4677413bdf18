import { createHash } from 'node:crypto';

import type { Transaction } from 'sequelize';

import { canonicalJson, deviationActionRefusal, type DeviationAction } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict, notFound } from '../errors/app-error';
import { DeviationDispositionModel } from '../models/deviation-disposition.model';
import type { DeviationEventKind } from '../models/deviation-event.model';
import { DeviationEventModel } from '../models/deviation-event.model';
import { DeviationModel } from '../models/deviation.model';
import { parseJsonColumn } from './catalogue-dto';

/** Reads a deviation (404 when missing); with `lock`, FOR UPDATE so writes to one deviation take turns. */
export async function loadDeviation(id: number, transaction?: Transaction, lock = false): Promise<DeviationModel> {
  const row = await DeviationModel.findByPk(id, { transaction, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
  if (!row) throw notFound('Deviation', id);
  return row;
}

/**
 * What was found, where, and where it stands: the part the audit record and the API's summary
 * share. A field added here also enters the content hash that review signatures cover.
 */
export const deviationFacts = (row: DeviationModel) => ({
  id: row.id,
  runId: row.runId,
  stepId: row.stepId,
  rule: row.rule,
  severity: row.severity,
  state: row.state,
  title: row.title,
  expected: row.expected,
  actual: row.actual,
  pieceIds: parseJsonColumn<number[]>(row.pieceIds, []),
  photoFileIds: parseJsonColumn<number[]>(row.photoFileIds, []),
});

/** The deviation as the audit trail keeps it (before/after of every review change). */
export const deviationRecord = (row: DeviationModel) => ({
  ...deviationFacts(row),
  assigneeId: row.assigneeId ?? null,
  revision: row.revision,
  closureNote: row.closureNote ?? null,
});

/** A disposition as its signature covers it: the decision, never its later verification. */
const dispositionRecord = (row: DeviationDispositionModel) => ({
  id: row.id,
  disposition: row.disposition,
  rationale: row.rationale,
  pieceIds: parseJsonColumn<number[]>(row.pieceIds, []),
  reworkStepIds: parseJsonColumn<string[]>(row.reworkStepIds, []),
  reworkRunId: row.reworkRunId,
  correctiveAction: row.correctiveActionNote === null ? null : { note: row.correctiveActionNote, ownerId: row.correctiveActionOwnerId, dueOn: row.correctiveActionDueOn },
});

/**
 * SHA-256 of the canonical JSON of what a reviewer decides on: the deviation's facts and state
 * and its dispositions so far. History lines (comments, refused signatures) are left out, so a
 * colleague's comment does not turn a signature that is under way stale.
 */
export function deviationContentHash(row: DeviationModel, dispositions: readonly DeviationDispositionModel[]): string {
  const record = { deviation: deviationRecord(row), dispositions: dispositions.map(dispositionRecord) };
  return createHash('sha256').update(canonicalJson(record), 'utf8').digest('hex');
}

export const dispositionsOf = (deviationId: number, transaction?: Transaction) =>
  DeviationDispositionModel.findAll({ where: { deviationId }, order: [['id', 'ASC']], transaction });

export async function currentContentHash(row: DeviationModel, transaction?: Transaction): Promise<string> {
  return deviationContentHash(row, await dispositionsOf(row.id, transaction));
}

/** 409 in the words of the shared transitions when the deviation's state does not allow the action. */
export function assertDeviationAllows(row: DeviationModel, action: DeviationAction): void {
  const refusal = deviationActionRefusal(row.state, action, row.id);
  if (refusal) throw conflict(`${refusal} Reload to see where it stands.`, { state: row.state });
}

/** A change of the deviation's state: the revision goes up, so any content hash taken before is stale. */
export async function changeDeviation(ctx: Pick<AppContext, 'clock'>, row: DeviationModel, changes: Partial<DeviationModel>, transaction: Transaction): Promise<void> {
  await row.update({ ...changes, revision: row.revision + 1, updatedAt: ctx.clock.now() }, { transaction });
}

/** One line of the deviation's history, in the transaction of the change it tells. */
export async function addDeviationEvent(
  ctx: Pick<AppContext, 'clock'>,
  event: { deviationId: number; kind: DeviationEventKind; text: string; byId: number | null },
  transaction: Transaction,
): Promise<void> {
  await DeviationEventModel.create({ ...event, at: ctx.clock.now() }, { transaction });
}
