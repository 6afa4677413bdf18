import type { z } from 'zod';

import { deviationDraft, runProgress, treatmentWaitExceeded, type DeviationSummary, type RecipeStep } from '@tracewright/shared';
import type { CompleteStepInputSchema, DeviceStampSchema, StepNotDoneInputSchema } from '@tracewright/shared';
import type { StepWriteResult } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { findRow, findRows, updateRow } from '../db/direct-rows';
import { conflict } from '../errors/app-error';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunTimerModel } from '../models/run-timer.model';
import { raiseDeviation } from './deviation.service';
import type { TabletWrite, WriteResult } from './idempotency.service';
import { peopleNames } from './recipe-dto';
import { loadReferences } from './recipe-references';
import { stampedTime } from './run-clock';
import { stepAt, type StepAt } from './run-content';
import { safetyNotesByStep } from './run-step-context';
import { auditRun, lockStepRecord, moveRun, readStep, runWrite, stepAnswer, stepResult, type RunScope } from './run-write';

type DeviceStamp = z.infer<typeof DeviceStampSchema>;

const name = (at: StepAt) => `Step ${at.ref.number} “${at.ref.title}”`;

/** Why a step that is not pending cannot start or be closed again: who did what, when. */
async function settledConflict(scope: RunScope, at: StepAt, record: RunStepRecordModel, doing: string) {
  if (record.state === 'pending') return conflict(`${name(at)} has not been started, so it cannot be ${doing}. Start it first.`, { state: record.state });
  const who = record.state === 'in-progress' ? record.startedBy : record.completedBy;
  const when = record.state === 'in-progress' ? record.startedAt : record.completedAt;
  const person = (await peopleNames([who], scope.transaction)).get(who ?? -1) ?? 'someone';
  const what = { 'in-progress': 'was already started', done: 'was already completed', 'not-done': 'was already closed as not done' }[record.state];
  const details = { state: record.state, by: who === null ? null : { id: who, name: person }, at: when?.toISOString() ?? null };
  return conflict(`${name(at)} ${what} by ${person} at ${when?.toISOString()}, so it cannot be ${doing}. Reload to see where the run stands.`, details);
}

const runningTimerConflict = (at: StepAt, running: Pick<RunTimerModel, 'id' | 'label'>, doing: string) =>
  conflict(`The timer “${running.label}” of ${name(at)} is still running. Stop it first (its time is judged against the step's window), then ${doing}.`, { timerId: running.id });

async function assertNoRunningTimer(scope: RunScope, at: StepAt, doing: string) {
  const running = await findRow(RunTimerModel, scope.connection, { runId: scope.run.id, stepId: at.step.id, stoppedAt: null });
  if (running) throw runningTimerConflict(at, running, doing);
}

/** The run completes once every step is done or not done. */
async function settleRun(scope: RunScope): Promise<void> {
  const records = await findRows(RunStepRecordModel, scope.connection, { runId: scope.run.id });
  if (runProgress(scope.content.steps, records).isComplete) await moveRun(scope, 'completed', 'completed');
}

/** Printing too long after a surface treatment raises a deviation per treatment that faded. */
async function treatmentWaitDeviations(scope: RunScope, at: StepAt, startedAt: Date): Promise<DeviationSummary[]> {
  const records = await findRows(RunStepRecordModel, scope.connection, { runId: scope.run.id, state: 'done' });
  const late = treatmentWaitExceeded(scope.content.steps, records, startedAt, scope.ctx.clock.now()).filter((w) => w.isExceeded && w.printStepId === at.step.id);
  const raised: DeviationSummary[] = [];
  for (const wait of late) {
    const treatment = stepAt(scope.content, scope.run, wait.treatmentStepId);
    const draft = deviationDraft('treatment-wait-exceeded', { treatment: treatment.ref, print: at.ref, waitedMinutes: wait.waitedMinutes, maxMinutes: wait.maxMinutes });
    raised.push(await raiseDeviation(scope.ctx, scope.actor, scope.run.id, draft, { stepId: at.step.id }, scope.transaction));
  }
  return raised;
}

/** The operator read the step's safety card. The first acknowledgement stands; later ones change nothing. */
export function acknowledgeSafety(ctx: AppContext, write: TabletWrite, runId: number, stepId: string, input: DeviceStamp): Promise<WriteResult<StepWriteResult>> {
  return runWrite(ctx, write, runId, 200, async (scope) => {
    const at = stepAt(scope.content, scope.run, stepId);
    const record = await lockStepRecord(scope, stepId);
    if (record.state === 'done' || record.state === 'not-done') throw await settledConflict(scope, at, record, 'acknowledged now');
    if (record.safetyAcknowledgedAt === null) {
      const time = stampedTime(ctx, input);
      await updateRow(record, scope.connection, { safetyAcknowledgedBy: scope.actor.id, safetyAcknowledgedAt: time.at, hasDeviceTime: record.hasDeviceTime || time.isDeviceClock });
      await auditRun(scope, { action: 'run-step.safety-acknowledged', entityType: 'run', entityId: scope.run.id, after: { stepId, at: time.at, deviceTime: time.deviceTime } });
    }
    return stepResult(scope, stepId, []);
  });
}

/** Refused while a step with cautions waits for its safety card to be acknowledged. */
async function assertSafetyAcknowledged(scope: RunScope, at: StepAt, record: RunStepRecordModel) {
  if (record.safetyAcknowledgedAt !== null) return;
  const notes = safetyNotesByStep(scope.content, await loadReferences(scope.content, scope.transaction))[at.step.id] ?? [];
  if (notes.length > 0) throw conflict(`${name(at)} has safety cautions: read and acknowledge its safety card before you start.`, { safetyNotes: notes });
}

/** Pending → in progress. The run's first start moves it from planned to in progress. */
export function startStep(ctx: AppContext, write: TabletWrite, runId: number, stepId: string, input: DeviceStamp): Promise<WriteResult<StepWriteResult>> {
  return runWrite(ctx, write, runId, 200, async (scope) => {
    const at = stepAt(scope.content, scope.run, stepId);
    const record = await lockStepRecord(scope, stepId);
    if (record.state !== 'pending') throw await settledConflict(scope, at, record, 'started');
    await assertSafetyAcknowledged(scope, at, record);
    const time = stampedTime(ctx, input);
    await updateRow(record, scope.connection, { state: 'in-progress', startedBy: scope.actor.id, startedAt: time.at, hasDeviceTime: record.hasDeviceTime || time.isDeviceClock });
    await auditRun(scope, { action: 'run-step.started', entityType: 'run', entityId: scope.run.id, after: { stepId, at: time.at, deviceTime: time.deviceTime } });
    const deviations = isPrintPass(at.step) ? await treatmentWaitDeviations(scope, at, time.at) : [];
    if (scope.run.state === 'planned') await moveRun(scope, 'in-progress', 'started');
    return stepResult(scope, stepId, deviations);
  });
}

const isPrintPass = (step: RecipeStep) => step.kind === 'print-pass';

/** In progress → done, once: a second tablet completing the same step gets 409 naming who and when. */
export function completeStep(ctx: AppContext, write: TabletWrite, runId: number, stepId: string, input: z.infer<typeof CompleteStepInputSchema>): Promise<WriteResult<StepWriteResult>> {
  // The busiest write of the product: read with the run in one round trip, written with the stored answer in one more.
  return runWrite(
    ctx,
    write,
    runId,
    200,
    async (scope) => {
      const at = stepAt(scope.content, scope.run, stepId);
      const snapshot = scope.step ?? (await readStep(scope, stepId));
      const { record } = snapshot;
      if (record.state !== 'in-progress') throw await settledConflict(scope, at, record, 'completed');
      const running = snapshot.runningTimers[0];
      if (running) throw runningTimerConflict(at, running, 'complete the step');
      const time = stampedTime(ctx, input);
      scope.defer(updateRow(record, scope.connection, { state: 'done', completedBy: scope.actor.id, completedAt: time.at, note: input.note, hasDeviceTime: record.hasDeviceTime || time.isDeviceClock }));
      scope.defer(auditRun(scope, { action: 'run-step.completed', entityType: 'run', entityId: scope.run.id, after: { stepId, at: time.at, deviceTime: time.deviceTime, note: input.note } }));
      if (runProgress(scope.content.steps, snapshot.records).isComplete) await moveRun(scope, 'completed', 'completed');
      return stepAnswer(scope, snapshot, []);
    },
    { step: stepId },
  );
}

/** Pending or in progress → not done, with the reason; always a deviation. */
export function markStepNotDone(ctx: AppContext, write: TabletWrite, runId: number, stepId: string, input: z.infer<typeof StepNotDoneInputSchema>): Promise<WriteResult<StepWriteResult>> {
  return runWrite(ctx, write, runId, 200, async (scope) => {
    const at = stepAt(scope.content, scope.run, stepId);
    const record = await lockStepRecord(scope, stepId);
    if (record.state === 'done' || record.state === 'not-done') throw await settledConflict(scope, at, record, 'closed as not done');
    await assertNoRunningTimer(scope, at, 'close the step');
    const time = stampedTime(ctx, input);
    await updateRow(record, scope.connection, { state: 'not-done', notDoneReason: input.reason, completedBy: scope.actor.id, completedAt: time.at, hasDeviceTime: record.hasDeviceTime || time.isDeviceClock });
    await auditRun(scope, { action: 'run-step.not-done', entityType: 'run', entityId: scope.run.id, after: { stepId, at: time.at, deviceTime: time.deviceTime }, reason: input.reason });
    const draft = deviationDraft('step-not-done', { step: at.ref, reason: input.reason });
    const deviation = await raiseDeviation(ctx, scope.actor, scope.run.id, draft, { stepId }, scope.transaction);
    if (scope.run.state === 'planned') await moveRun(scope, 'in-progress', 'started');
    await settleRun(scope);
    return stepResult(scope, stepId, [deviation]);
  });
}
