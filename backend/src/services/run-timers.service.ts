import type { z } from 'zod';

import { deviationDraft, formatNumber, stateInWords, timerOutcome, type DeviationSummary } from '@tracewright/shared';
import type { StartTimerInputSchema, StopTimerInputSchema } from '@tracewright/shared';
import type { TimerWriteResult } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { badRequest, conflict, notFound } from '../errors/app-error';
import { RunTimerModel } from '../models/run-timer.model';
import { raiseDeviation } from './deviation.service';
import type { TabletWrite, WriteResult } from './idempotency.service';
import { peopleNames } from './recipe-dto';
import { stampedTime } from './run-clock';
import { stepAt, type StepAt } from './run-content';
import { toTimerView } from './run-dto';
import { auditRun, lockStepRecord, noteDeviceTime, runWrite, type RunScope } from './run-write';

const name = (at: StepAt) => `step ${at.ref.number} “${at.ref.title}”`;

async function timerResult(scope: RunScope, timer: RunTimerModel, deviations: DeviationSummary[]): Promise<TimerWriteResult> {
  const people = await peopleNames([timer.startedBy], scope.transaction);
  return { runId: scope.run.id, runState: scope.run.state, deviations, timer: toTimerView(timer, people) };
}

/**
 * Starts a timer at a step in progress; one runs per step at a time. Its start is our clock,
 * or the tablet's when the start was made offline (flagged startedOnDeviceClock).
 */
export function startTimer(ctx: AppContext, write: TabletWrite, runId: number, input: z.infer<typeof StartTimerInputSchema>): Promise<WriteResult<TimerWriteResult>> {
  return runWrite(ctx, write, runId, 201, async (scope) => {
    const at = stepAt(scope.content, scope.run, input.stepId);
    const record = await lockStepRecord(scope, input.stepId);
    if (record.state !== 'in-progress') throw conflict(`Start ${name(at)} before its timer (it is ${stateInWords(record.state)}).`, { state: record.state });
    const running = await RunTimerModel.findOne({ where: { runId: scope.run.id, stepId: input.stepId, stoppedAt: null }, transaction: scope.transaction });
    if (running) throw conflict(`The timer “${running.label}” of ${name(at)} is already running since ${running.startedAt.toISOString()}.`, { timerId: running.id });
    const time = stampedTime(ctx, input);
    const timer = await RunTimerModel.create(
      { runId: scope.run.id, stepId: input.stepId, label: input.label, plannedSeconds: input.plannedSeconds, startedAt: time.at, startedOnDeviceClock: time.isDeviceClock, startedBy: scope.actor.id },
      { transaction: scope.transaction },
    );
    await noteDeviceTime(scope, input.stepId, time);
    await auditRun(scope, { action: 'run-timer.started', entityType: 'run-timer', entityId: timer.id, after: { runId: scope.run.id, ...toTimerView(timer, new Map()), deviceTime: time.deviceTime } });
    return timerResult(scope, timer, []);
  });
}

/**
 * Stops a timer and judges it against its step's window (shared timerOutcome): before the
 * shortest time raises `timer-ended-early`; past the longest needs a reason (400 without) and
 * raises `timer-over-maximum`.
 */
export function stopTimer(ctx: AppContext, write: TabletWrite, runId: number, timerId: number, input: z.infer<typeof StopTimerInputSchema>): Promise<WriteResult<TimerWriteResult>> {
  return runWrite(ctx, write, runId, 200, async (scope) => {
    const timer = await RunTimerModel.findOne({ where: { id: timerId, runId: scope.run.id }, transaction: scope.transaction, lock: scope.transaction.LOCK.UPDATE });
    if (!timer) throw notFound(`Timer ${timerId} of run ${scope.run.code}`);
    if (timer.stoppedAt !== null) {
      const by = (await peopleNames([timer.stoppedBy], scope.transaction)).get(timer.stoppedBy ?? -1) ?? 'someone';
      throw conflict(`The timer “${timer.label}” was already stopped by ${by} at ${timer.stoppedAt.toISOString()}.`, { stoppedAt: timer.stoppedAt.toISOString(), stoppedBy: timer.stoppedBy });
    }
    const at = stepAt(scope.content, scope.run, timer.stepId);
    const time = stampedTime(ctx, input);
    const outcome = timerOutcome(at.step, timer, time.at);
    if (outcome.overMaximum && !input.reason) {
      const message = `The timer ran ${formatNumber(outcome.elapsedMinutes)} min, past the longest time of ${name(at)} (${formatNumber(at.step.maxMinutes ?? 0)} min). Say why before stopping it.`;
      throw badRequest(message, { formErrors: [], fieldErrors: { reason: [message] } });
    }
    await timer.update({ stoppedAt: time.at, stoppedOnDeviceClock: time.isDeviceClock, stoppedBy: scope.actor.id, stopReason: input.reason }, { transaction: scope.transaction });
    await noteDeviceTime(scope, timer.stepId, time);
    await auditRun(scope, { action: 'run-timer.stopped', entityType: 'run-timer', entityId: timer.id, after: { runId: scope.run.id, stoppedAt: time.at, deviceTime: time.deviceTime, ...outcome }, reason: input.reason });
    return timerResult(scope, timer, await timerDeviations(scope, at, timer, outcome, input.reason));
  });
}

async function timerDeviations(scope: RunScope, at: StepAt, timer: RunTimerModel, outcome: ReturnType<typeof timerOutcome>, reason: string | null) {
  const origin = { stepId: at.step.id, source: { type: 'timer', id: timer.id } };
  const raise = (draft: ReturnType<typeof deviationDraft>) => raiseDeviation(scope.ctx, scope.actor, scope.run.id, draft, origin, scope.transaction);
  const { minMinutes, maxMinutes } = at.step;
  const raised: DeviationSummary[] = [];
  if (outcome.endedEarly && minMinutes !== null) raised.push(await raise(deviationDraft('timer-ended-early', { step: at.ref, elapsedMinutes: outcome.elapsedMinutes, minMinutes })));
  if (outcome.overMaximum && maxMinutes !== null) raised.push(await raise(deviationDraft('timer-over-maximum', { step: at.ref, elapsedMinutes: outcome.elapsedMinutes, maxMinutes, reason })));
  return raised;
}
