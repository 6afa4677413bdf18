import { describe, expect, it } from 'vitest';

import type { OutboxItem } from '../outbox/outbox-types';
import { aRun, aStepRecord, CURE_STEP_ID, RUN_ID } from '../testing/run-fixtures';
import { applyWrites } from './apply-writes';
import { recordOf } from './bench-run';
import { writeDrafts } from './write-drafts';

let seq = 0;
function anItem(draft: ReturnType<(typeof writeDrafts)[keyof typeof writeDrafts]>, overrides: Partial<OutboxItem> = {}): OutboxItem {
  seq += 1;
  return {
    id: `item-${seq}`,
    idempotencyKey: `key-${seq}`,
    seq,
    runId: draft.runId,
    userId: 1,
    userName: 'Robin Vale',
    kind: draft.kind,
    path: draft.path,
    body: { ...(draft.body ?? {}), deviceTime: '2026-12-02T10:00:00.000Z', madeOffline: true },
    photo: null,
    stepId: draft.stepId ?? null,
    createdAt: '2026-12-02T10:00:00.000Z',
    madeOffline: true,
    status: 'waiting',
    attempts: 0,
    error: null,
    resultId: null,
    sentAt: null,
    meta: draft.meta ?? {},
    ...overrides,
  };
}

describe('applyWrites', () => {
  it('when a start and a timer wait in the outbox, then the step shows in progress with the timer on the tablet clock', () => {
    const bench = applyWrites(aRun(), [anItem(writeDrafts.startStep(RUN_ID, CURE_STEP_ID)), anItem(writeDrafts.startTimer(RUN_ID, CURE_STEP_ID, 'Cure', 1800))]);

    expect(recordOf(bench, CURE_STEP_ID)).toMatchObject({ state: 'in-progress', startedBy: { name: 'Robin Vale' } });
    expect(bench.timers).toEqual([expect.objectContaining({ label: 'Cure', plannedSeconds: 1800, startedOnDeviceClock: true, isPending: true })]);
  });

  it('when another tablet finished the step since, then a late start from the outbox does not move it back', () => {
    const run = aRun({ steps: [aStepRecord(CURE_STEP_ID, { state: 'done', completedAt: '2026-12-02T10:05:00.000Z', completedBy: { id: 2, name: 'Mika Sato' } })] });

    expect(recordOf(applyWrites(run, [anItem(writeDrafts.startStep(RUN_ID, CURE_STEP_ID))]), CURE_STEP_ID).state).toBe('done');
  });

  it('when a sent timer is already in the server answer, then it shows once and keeps its alarm key', () => {
    const start = anItem(writeDrafts.startTimer(RUN_ID, CURE_STEP_ID, 'Cure', 1800), { status: 'sent', resultId: 55 });
    const run = aRun({ timers: [{ id: 55, stepId: CURE_STEP_ID, label: 'Cure', plannedSeconds: 1800, startedAt: '2026-12-02T10:00:01.000Z', stoppedAt: null, startedOnDeviceClock: false, startedBy: null }] });

    const bench = applyWrites(run, [start]);

    expect(bench.timers).toHaveLength(1);
    expect(bench.timers[0]).toMatchObject({ id: 55, alarmKey: start.id, isPending: false });
  });

  it('when a write was refused, then it is not shown as done', () => {
    const refused = anItem(writeDrafts.startStep(RUN_ID, CURE_STEP_ID), { status: 'failed' });

    expect(recordOf(applyWrites(aRun(), [refused]), CURE_STEP_ID).state).toBe('pending');
  });
});
