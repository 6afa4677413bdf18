import { describe, expect, it } from 'vitest';

import { AuditEventModel } from '../models/audit-event.model';
import { DeviationModel } from '../models/deviation.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunTimerModel } from '../models/run-timer.model';
import { setUpRunLab } from '../../test/run-lab';
import { newKey, post } from '../../test/run-fixtures';

// The Idempotency-Key of tablet writes, exercised through run routes (any tablet write would do).
const lab = setUpRunLab({ runQuantity: 1 });
const { newRun, step } = lab;

const MINUTE = 60_000;

describe('idempotency of tablet writes', () => {
  it('when the same key is sent twice, then the write happens once and the second answer replays the first', async () => {
    const run = await newRun();
    const key = newKey();
    const first = await step(run.id, 'plasma-1', 'start', {}, lab.operator, key);
    lab.clock.advance(MINUTE);
    const second = await step(run.id, 'plasma-1', 'start', {}, lab.operator, key);
    expect(first.status).toBe(200);
    expect(second.status).toBe(200);
    expect(second.body).toEqual(first.body);
    expect(second.headers['idempotent-replay']).toBe('true');
    expect(first.headers['idempotent-replay']).toBeUndefined();
    expect(await AuditEventModel.count({ where: { action: 'run-step.started', entityId: String(run.id) } })).toBe(1);
  });

  it('when the same key comes twice at once, then one write happens and both get its answer', async () => {
    const run = (await lab.dryingRun()).id;
    const key = newKey();
    const body = { stepId: 'dry-ag-1', label: 'Dry', plannedSeconds: 420 };
    const [a, b] = await Promise.all([post(lab.operator, `/api/runs/${run}/timers`, body, key), post(lab.operator, `/api/runs/${run}/timers`, body, key)]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body).toEqual(b.body);
    expect(await RunTimerModel.count({ where: { runId: run } })).toBe(1);
  });

  it('when a key is reused with another body, then 422 and nothing is done; another person may use the same key', async () => {
    const run = await newRun();
    const key = newKey();
    expect((await step(run.id, 'plasma-1', 'not-done', { reason: 'First reason' }, lab.operator, key)).status).toBe(200);
    const reused = await step(run.id, 'plasma-1', 'not-done', { reason: 'Second reason' }, lab.operator, key);
    expect(reused.status).toBe(422);
    expect(reused.body.error.message).toMatch(/already used for a different request/);
    expect((await step(run.id, 'print-ag-1', 'acknowledge-safety', {}, lab.operator2, key)).status).toBe(200);
    expect(await DeviationModel.count({ where: { runId: run.id } })).toBe(1);
  });

  it('when a refused write is retried with its key after the cause is fixed, then it goes through', async () => {
    const run = await newRun();
    const key = newKey();
    expect((await step(run.id, 'print-ag-1', 'start', {}, lab.operator, key)).status).toBe(409);
    await step(run.id, 'print-ag-1', 'acknowledge-safety');
    expect((await step(run.id, 'print-ag-1', 'start', {}, lab.operator, key)).status).toBe(200);
  });

  it('when the key is malformed, then 400 and nothing is done', async () => {
    const run = await newRun();
    for (const key of ['has space', 'x'.repeat(101), 'semi;colon']) {
      expect((await step(run.id, 'plasma-1', 'start', {}, lab.operator, key)).status).toBe(400);
    }
    expect((await RunStepRecordModel.findOne({ where: { runId: run.id, stepId: 'plasma-1' } }))?.state).toBe('pending');
  });
});
