import type { Connection } from 'mariadb';
import type { Attributes, Transaction } from 'sequelize';

import { canTransition, type DeviationSummary, type DraftContent, type RunState } from '@tracewright/shared';
import type { StepWriteResult } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { connectionOf, findPlainRows, findRow, findRows, updateRow } from '../db/direct-rows';
import { conflict } from '../errors/app-error';
import { RunLotConfirmationModel } from '../models/run-lot-confirmation.model';
import { RunNozzleCheckModel } from '../models/run-nozzle-check.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunTimerModel } from '../models/run-timer.model';
import type { RunModel } from '../models/run.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { idempotentTransaction, type DeferWrite, type TabletWrite, type WriteResult } from './idempotency.service';
import { labToday } from './lab-calendar';
import { assertAcceptsWrites, lockRunWithContent } from './run-content';
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
  /** The transaction's connection, for the direct reads and writes of the hot path (db/direct-rows). */
  connection: Connection;
  /** Today in the lab's calendar (expiry and calibration dates are days there). */
  today: string;
  /** Sends a write now; it is awaited with the stored answer, before the commit. */
  defer: DeferWrite;
  /** The step named by runWrite's `step` option, read with the run. */
  step: StepSnapshot | null;
}

/**
 * A tablet write: one transaction holding the Idempotency-Key, the run's row lock, the change
 * and its audit rows. Refused on runs that take no records. `work` returns the answer's body.
 * With `step`, the step is read for the write (`scope.step`) in the same round trip as the run.
 */
export async function runWrite<T>(
  ctx: AppContext,
  write: TabletWrite,
  runId: number,
  status: number,
  work: (scope: RunScope) => Promise<T>,
  options: { step?: string } = {},
): Promise<WriteResult<T>> {
  // Read before the transaction: it uses its own connection and must not see a half-made write.
  const today = await labToday(ctx);
  return idempotentTransaction(ctx, write.claim, status, async (transaction, defer) => {
    const connection = connectionOf(transaction);
    const [{ run, content }, stepRows] = await Promise.all([lockRunWithContent(transaction, runId), options.step ? readStepRows(connection, runId, options.step) : null]);
    assertAcceptsWrites(run);
    const scope: RunScope = { ctx, actor: write.actor, run, content, transaction, connection, today, defer, step: null };
    // A step the recipe does not have is left to the work, which answers 404 naming it.
    const { step } = options;
    if (step && stepRows && content.steps.some((s) => s.id === step)) scope.step = stepSnapshot(scope, step, stepRows);
    return work(scope);
  });
}

/** One audit row in the write's transaction. */
export function auditRun(scope: RunScope, entry: { action: string; entityType: string; entityId: number | string; before?: unknown; after?: unknown; reason?: string | null }) {
  return recordAudit(scope.ctx, { actorId: scope.actor.id, ...entry }, scope.transaction);
}

/** The step's record, locked: a second tablet completing the same step waits here and then sees the first. */
export async function lockStepRecord(scope: RunScope, stepId: string): Promise<RunStepRecordModel> {
  const record = await findRow(RunStepRecordModel, scope.connection, { runId: scope.run.id, stepId }, { lock: true });
  // Made for every step when the run was planned; a missing one means the rows were tampered with.
  if (!record) throw conflict(`Run ${scope.run.code} has no record for step “${stepId}”. Tell your admin.`);
  return record;
}

/** Flags a step whose records carry a tablet's clock (the run view shows it). */
export async function noteDeviceTime(scope: RunScope, stepId: string, time: StampedTime): Promise<void> {
  if (!time.isDeviceClock) return;
  await scope.connection.query('UPDATE run_step_records SET has_device_time = TRUE, updated_at = ? WHERE run_id = ? AND step_id = ?', [new Date(), scope.run.id, stepId]);
}

/** Moves the run on when the shared transitions allow it; audited as `run.<verb>`. */
export async function moveRun(scope: RunScope, to: RunState, verb: string, reason: string | null = null): Promise<boolean> {
  const { run } = scope;
  if (!canTransition(run.state, to)) return false;
  const before = runRecord(run);
  // Sent together: the connection runs them in order, and either failing rolls the write back.
  const saved = updateRow(run, scope.connection, { state: to, version: run.version + 1 });
  await Promise.all([saved, auditRun(scope, { action: `run.${verb}`, entityType: 'run', entityId: run.id, before, after: { ...runRecord(run), state: to, version: run.version + 1 }, reason })]);
  return true;
}

/** One step of the locked run as a write needs it, read in one round trip. */
export interface StepSnapshot {
  /** The step's record, locked FOR UPDATE. */
  record: RunStepRecordModel;
  /** Every step's record of the run (the step's own included, as the write changes it), for the run's progress. */
  records: Array<Pick<RunStepRecordModel, 'stepId' | 'state'>>;
  confirmations: Array<Attributes<RunLotConfirmationModel>>;
  checks: Array<Attributes<RunNozzleCheckModel>>;
  /** The step's timers still running. */
  runningTimers: Array<Attributes<RunTimerModel>>;
  /** Names of the people on the step's record, and of the actor. */
  people: Map<number, string>;
}

type StepRows = [RunStepRecordModel | null, Array<Attributes<RunStepRecordModel>>, Array<Attributes<RunLotConfirmationModel>>, Array<Attributes<RunNozzleCheckModel>>, Array<Attributes<RunTimerModel>>, Array<{ id: number; name: string }>];

/** A step's rows for a write, its record locked first; one round trip (pipelined on the connection). */
function readStepRows(connection: Connection, runId: number, stepId: string): Promise<StepRows> {
  const where = { runId, stepId };
  const namesSql =
    'SELECT u.id, u.name FROM run_step_records r JOIN users u ON u.id IN (r.safety_acknowledged_by, r.started_by, r.completed_by) WHERE r.run_id = ? AND r.step_id = ?';
  return Promise.all([
    findRow(RunStepRecordModel, connection, where, { lock: true }),
    findPlainRows(RunStepRecordModel, connection, { runId }),
    findPlainRows(RunLotConfirmationModel, connection, where),
    findPlainRows(RunNozzleCheckModel, connection, where),
    findPlainRows(RunTimerModel, connection, { ...where, stoppedAt: null }),
    connection.query(namesSql, [runId, stepId]) as Promise<Array<{ id: number; name: string }>>,
  ]);
}

function stepSnapshot(scope: Pick<RunScope, 'run' | 'actor'>, stepId: string, [record, records, confirmations, checks, runningTimers, names]: StepRows): StepSnapshot {
  // Made for every step when the run was planned; a missing one means the rows were tampered with.
  if (!record) throw conflict(`Run ${scope.run.code} has no record for step “${stepId}”. Tell your admin.`);
  const people = new Map(names.map((u) => [Number(u.id), u.name]));
  people.set(scope.actor.id, scope.actor.name);
  return { record, records: records.map((r) => (r.id === record.id ? record : r)), confirmations, checks, runningTimers, people };
}

/** Reads a step for a write: its record locked first, then what the answer and the rules need. */
export async function readStep(scope: RunScope, stepId: string): Promise<StepSnapshot> {
  return stepSnapshot(scope, stepId, await readStepRows(scope.connection, scope.run.id, stepId));
}

/** The answer of a step write from a snapshot the write has brought up to date (no second read). */
export function stepAnswer(scope: RunScope, snapshot: StepSnapshot, deviations: DeviationSummary[]): StepWriteResult {
  return { runId: scope.run.id, runState: scope.run.state, deviations, step: toStepRecordView(snapshot.record, snapshot.people, snapshot.confirmations, snapshot.checks) };
}

/** The answer of a step write: the step as the run view shows it, and what the write raised. */
export async function stepResult(scope: RunScope, stepId: string, deviations: DeviationSummary[]): Promise<StepWriteResult> {
  const where = { runId: scope.run.id, stepId };
  const { connection, transaction } = scope;
  const [record, confirmations, checks] = await Promise.all([
    findRow(RunStepRecordModel, connection, where),
    findRows(RunLotConfirmationModel, connection, where),
    findRows(RunNozzleCheckModel, connection, where),
  ]);
  if (!record) throw conflict(`Run ${scope.run.code} has no record for step “${stepId}”. Tell your admin.`);
  const people = await peopleNames([record.safetyAcknowledgedBy, record.startedBy, record.completedBy], transaction);
  return { runId: scope.run.id, runState: scope.run.state, deviations, step: toStepRecordView(record, people, confirmations, checks) };
}
