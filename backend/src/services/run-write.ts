import type { Transaction } from 'sequelize';

import { canTransition, type DeviationSummary, type DraftContent, type RunState } from '@tracewright/shared';
import type { StepWriteResult } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { conflict } from '../errors/app-error';
import { RunLotConfirmationModel } from '../models/run-lot-confirmation.model';
import { RunNozzleCheckModel } from '../models/run-nozzle-check.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import type { RunModel } from '../models/run.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { idempotentTransaction, type TabletWrite, type WriteResult } from './idempotency.service';
import { labToday } from './lab-calendar';
import { assertAcceptsWrites, loadRun, runContent } from './run-content';
import { runRecord, toStepRecordView } from './run-dto';
import type { StampedTime } from './run-clock';
import { peopleNames } from './recipe-dto';

/** Everything a tablet write works with, inside its transaction, with its run locked. */
export interface RunScope {
  ctx: AppContext;
  actor: UserModel;
  run: RunModel;
  /** The version's content with the run's machines in place. */
  content: DraftContent;
  transaction: Transaction;
  /** Today in the lab's calendar (expiry and calibration dates are days there). */
  today: string;
}

/**
 * A tablet write: one transaction holding the Idempotency-Key, the run's row lock, the change
 * and its audit rows. Refused on runs that take no records. `work` returns the answer's body.
 */
export async function runWrite<T>(ctx: AppContext, write: TabletWrite, runId: number, status: number, work: (scope: RunScope) => Promise<T>): Promise<WriteResult<T>> {
  // Read before the transaction: it uses its own connection and must not see a half-made write.
  const today = await labToday(ctx);
  return idempotentTransaction(ctx, write.claim, status, async (transaction) => {
    const run = await loadRun(runId, transaction, true);
    assertAcceptsWrites(run);
    const content = await runContent(run, transaction);
    return work({ ctx, actor: write.actor, run, content, transaction, today });
  });
}

/** One audit row in the write's transaction. */
export function auditRun(scope: RunScope, entry: { action: string; entityType: string; entityId: number | string; before?: unknown; after?: unknown; reason?: string | null }) {
  return recordAudit(scope.ctx, { actorId: scope.actor.id, ...entry }, scope.transaction);
}

/** The step's record, locked: a second tablet completing the same step waits here and then sees the first. */
export async function lockStepRecord(scope: RunScope, stepId: string): Promise<RunStepRecordModel> {
  const record = await RunStepRecordModel.findOne({ where: { runId: scope.run.id, stepId }, transaction: scope.transaction, lock: scope.transaction.LOCK.UPDATE });
  // Made for every step when the run was planned; a missing one means the rows were tampered with.
  if (!record) throw conflict(`Run ${scope.run.code} has no record for step “${stepId}”. Tell your admin.`);
  return record;
}

/** Flags a step whose records carry a tablet's clock (the run view shows it). */
export async function noteDeviceTime(scope: RunScope, stepId: string, time: StampedTime): Promise<void> {
  if (!time.isDeviceClock) return;
  await RunStepRecordModel.update({ hasDeviceTime: true }, { where: { runId: scope.run.id, stepId }, transaction: scope.transaction });
}

/** Moves the run on when the shared transitions allow it; audited as `run.<verb>`. */
export async function moveRun(scope: RunScope, to: RunState, verb: string, reason: string | null = null): Promise<boolean> {
  const { run } = scope;
  if (!canTransition(run.state, to)) return false;
  const before = runRecord(run);
  await run.update({ state: to, version: run.version + 1 }, { transaction: scope.transaction });
  await auditRun(scope, { action: `run.${verb}`, entityType: 'run', entityId: run.id, before, after: runRecord(run), reason });
  return true;
}

/** The answer of a step write: the step as the run view shows it, and what the write raised. */
export async function stepResult(scope: RunScope, stepId: string, deviations: DeviationSummary[]): Promise<StepWriteResult> {
  const where = { runId: scope.run.id, stepId };
  const { transaction } = scope;
  const [record, confirmations, checks] = await Promise.all([
    RunStepRecordModel.findOne({ where, transaction }),
    RunLotConfirmationModel.findAll({ where, transaction }),
    RunNozzleCheckModel.findAll({ where, transaction }),
  ]);
  if (!record) throw conflict(`Run ${scope.run.code} has no record for step “${stepId}”. Tell your admin.`);
  const people = await peopleNames([record.safetyAcknowledgedBy, record.startedBy, record.completedBy], transaction);
  return { runId: scope.run.id, runState: scope.run.state, deviations, step: toStepRecordView(record, people, confirmations, checks) };
}
