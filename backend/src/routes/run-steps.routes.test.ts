import { describe, expect, it } from 'vitest';

import { StepRecordViewSchema, TimerViewSchema } from '@tracewright/shared';
import { StepWriteResultSchema, TimerWriteResultSchema } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { DeviationModel } from '../models/deviation.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunTimerModel } from '../models/run-timer.model';
import { RunModel } from '../models/run.model';
import { setUpRunLab } from '../../test/run-lab';
import { doStep, post, startStep } from '../../test/run-fixtures';

const lab = setUpRunLab({ runQuantity: 2 });
const { newRun, step, dryingRun } = lab;

const MINUTE = 60_000;
const deviationsOf = (runId: number) => DeviationModel.findAll({ where: { runId }, order: [['id', 'ASC']] });
const stateOf = async (runId: number) => (await RunModel.findByPk(runId))?.state;

describe('steps', () => {
  it('when the first step starts, then the run is in progress; when the last step is completed, then the run is completed', async () => {
    const run = await newRun();
    const started = await step(run.id, 'plasma-1', 'start');
    expect(started.status).toBe(200);
    const body = StepWriteResultSchema.parse(started.body);
    expect(body).toMatchObject({ runId: run.id, runState: 'in-progress', deviations: [], step: { stepId: 'plasma-1', state: 'in-progress', startedBy: { id: lab.operator.user.id } } });
    expect(await stateOf(run.id)).toBe('in-progress');
    for (const id of ['plasma-1']) expect((await step(run.id, id, 'complete', { note: 'Two passes' })).status).toBe(200);
    for (const id of ['print-ag-1', 'dry-ag-1', 'cure-ag-1']) await doStep(lab.operator, run.id, id);
    expect(await stateOf(run.id)).toBe('in-progress');
    const last = await doStep(lab.operator, run.id, 'inspect-1');
    expect(last.body.runState).toBe('completed');
    const record = await RunStepRecordModel.findOne({ where: { runId: run.id, stepId: 'plasma-1' } });
    expect(record).toMatchObject({ state: 'done', note: 'Two passes', completedBy: lab.operator.user.id });
    const actions = (await AuditEventModel.findAll({ where: { entityType: 'run', entityId: String(run.id) } })).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['run.started', 'run-step.started', 'run-step.completed', 'run.completed']));
  });

  it('when a step with cautions is started before its safety card is acknowledged, then 409 carries the cautions and the step stays pending', async () => {
    const run = await newRun();
    const refused = await step(run.id, 'print-ag-1', 'start');
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/acknowledge its safety card/);
    expect(refused.body.error.details.safetyNotes.map((n: { code: string }) => n.code)).toContain('nanoparticle');
    expect((await RunStepRecordModel.findOne({ where: { runId: run.id, stepId: 'print-ag-1' } }))?.state).toBe('pending');
    const ack = StepWriteResultSchema.parse((await step(run.id, 'print-ag-1', 'acknowledge-safety')).body);
    expect(ack.step.safetyAcknowledgedBy?.id).toBe(lab.operator.user.id);
    expect((await step(run.id, 'print-ag-1', 'start')).status).toBe(200);
  });

  it('when two tablets complete the same step at once, then exactly one completion is kept and the other gets 409 naming who and when', async () => {
    const run = await newRun();
    await startStep(lab.operator, run.id, 'plasma-1');
    const [a, b] = await Promise.all([step(run.id, 'plasma-1', 'complete', { note: 'A' }, lab.operator), step(run.id, 'plasma-1', 'complete', { note: 'B' }, lab.operator2)]);
    const statuses = [a.status, b.status].sort();
    expect(statuses).toEqual([200, 409]);
    const [winner, loser] = a.status === 200 ? [a, b] : [b, a];
    const done = StepRecordViewSchema.parse(winner.body.step);
    expect(loser.body.error.message).toMatch(new RegExp(`already completed by ${done.completedBy?.name} at ${done.completedAt}`));
    expect(loser.body.error.details).toMatchObject({ state: 'done', by: done.completedBy, at: done.completedAt });
    expect(await AuditEventModel.count({ where: { action: 'run-step.completed', entityId: String(run.id) } })).toBe(1);
  });

  it('when a step is closed as not done, then it needs a reason, opens a step-not-done deviation, and cannot be started after', async () => {
    const run = await newRun();
    expect((await step(run.id, 'plasma-1', 'not-done', {})).status).toBe(400);
    const res = await step(run.id, 'plasma-1', 'not-done', { reason: 'Plasma unit down; film pre-treated by supplier.' });
    expect(res.status).toBe(200);
    expect(res.body.deviations).toEqual([expect.objectContaining({ rule: 'step-not-done', severity: 'major', stepId: 'plasma-1' })]);
    expect(res.body.step).toMatchObject({ state: 'not-done', notDoneReason: 'Plasma unit down; film pre-treated by supplier.' });
    expect(res.body.runState).toBe('in-progress');
    const again = await step(run.id, 'plasma-1', 'start');
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already closed as not done/);
  });

  it('when an unknown step or run is named, then 404; a malformed step id, then 400', async () => {
    const run = await newRun();
    expect((await step(run.id, 'no-such-step', 'start')).status).toBe(404);
    const unknownCompleted = await step(run.id, 'no-such-step', 'complete');
    expect([unknownCompleted.status, unknownCompleted.body.error.message]).toEqual([404, `Step “no-such-step” in run ${run.code} not found.`]);
    expect((await step(99_999_999, 'plasma-1', 'start')).status).toBe(404);
    expect((await step(99_999_999, 'plasma-1', 'complete')).status).toBe(404);
    expect((await step(run.id, 'x', 'start')).status).toBe(400);
  });

  it('when a print pass starts longer after the treatment than the recipe allows, then a treatment-wait-exceeded deviation opens', async () => {
    const run = await newRun();
    await doStep(lab.operator, run.id, 'plasma-1');
    lab.clock.advance(45 * MINUTE);
    const res = await startStep(lab.operator, run.id, 'print-ag-1');
    expect(res.body.deviations).toEqual([expect.objectContaining({ rule: 'treatment-wait-exceeded', stepId: 'print-ag-1' })]);
    expect(res.body.deviations[0].actual).toMatch(/45 min after the treatment, 15 min late/);
  });

  it('when a print pass starts within the wait, then no deviation opens', async () => {
    const run = await newRun();
    await doStep(lab.operator, run.id, 'plasma-1');
    lab.clock.advance(20 * MINUTE);
    expect((await startStep(lab.operator, run.id, 'print-ag-1')).body.deviations).toEqual([]);
  });
});

describe('timers', () => {
  const startTimer = (runId: number, body: object = {}) => post(lab.operator, `/api/runs/${runId}/timers`, { stepId: 'dry-ag-1', label: 'Dry', plannedSeconds: 420, ...body });
  const stop = (runId: number, timerId: number, body: object = {}) => post(lab.operator, `/api/runs/${runId}/timers/${timerId}/stop`, body);

  it('when a timer is stopped before the step’s shortest time, then a timer-ended-early deviation opens', async () => {
    const run = await dryingRun();
    const started = await startTimer(run.id);
    expect(started.status).toBe(201);
    const timer = TimerViewSchema.parse(started.body.timer);
    expect(timer).toMatchObject({ startedAt: lab.clock.now().toISOString(), stoppedAt: null, startedOnDeviceClock: false });
    lab.clock.advance(3 * MINUTE);
    const stopped = TimerWriteResultSchema.parse((await stop(run.id, timer.id)).body);
    expect(stopped.timer.stoppedAt).toBe(lab.clock.now().toISOString());
    expect(stopped.deviations).toEqual([expect.objectContaining({ rule: 'timer-ended-early', severity: 'minor', stepId: 'dry-ag-1' })]);
    expect(stopped.deviations[0]?.actual).toBe('Stopped after 3 min, 2 min short.');
  });

  it('when a timer runs past the step’s longest time, then stopping needs a reason (400), and with one a timer-over-maximum deviation opens', async () => {
    const run = await dryingRun();
    const timer = (await startTimer(run.id)).body.timer;
    lab.clock.advance(12 * MINUTE);
    const refused = await stop(run.id, timer.id);
    expect(refused.status).toBe(400);
    expect(refused.body.error.details.fieldErrors.reason[0]).toMatch(/ran 12 min, past the longest time/);
    expect((await RunTimerModel.findByPk(timer.id))?.stoppedAt).toBeNull();
    const stopped = await stop(run.id, timer.id, { reason: 'Called away to the spill in bay 2.' });
    expect(stopped.status).toBe(200);
    expect(stopped.body.deviations).toEqual([expect.objectContaining({ rule: 'timer-over-maximum', stepId: 'dry-ag-1' })]);
    expect(stopped.body.deviations[0].actual).toMatch(/Ran 12 min, 2 min over\. Reason given: Called away/);
  });

  it('when a timer stops inside the window, then no deviation; while a timer runs, the step cannot complete', async () => {
    const run = await dryingRun();
    const timer = (await startTimer(run.id)).body.timer;
    const early = await step(run.id, 'dry-ag-1', 'complete');
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/still running. Stop it first/);
    expect((await startTimer(run.id)).status).toBe(409);
    lab.clock.advance(7 * MINUTE);
    expect((await stop(run.id, timer.id)).body.deviations).toEqual([]);
    expect((await stop(run.id, timer.id)).status).toBe(409);
    expect((await step(run.id, 'dry-ag-1', 'complete')).status).toBe(200);
    expect(await deviationsOf(run.id)).toEqual([]);
  });

  it('when a timer is started offline, then its start is the tablet’s clock, flagged, and the step shows device time', async () => {
    const run = await dryingRun();
    const deviceTime = new Date(lab.clock.now().getTime() - 4 * MINUTE).toISOString();
    const res = await startTimer(run.id, { deviceTime, madeOffline: true });
    expect(res.body.timer).toMatchObject({ startedAt: deviceTime, startedOnDeviceClock: true });
    const detail = await lab.operator.agent.get(`/api/runs/${run.id}`);
    expect(detail.body.steps.find((s: { stepId: string }) => s.stepId === 'dry-ag-1').hasDeviceTime).toBe(true);
  });

  it('when a timer is started on a step not started, then 409', async () => {
    const run = await newRun();
    expect((await startTimer(run.id)).status).toBe(409);
  });
});
