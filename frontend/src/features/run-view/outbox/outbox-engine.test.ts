import { HttpResponse } from 'msw';
import { afterEach, describe, expect, it, vi } from 'vitest';

import { server } from '../../../../test/msw-server';
import { sendWrite } from '../api/send-write';
import { createMemoryBenchStore } from '../storage/memory-bench-store';
import { aRun, CURE_STEP_ID, RUN_ID } from '../testing/run-fixtures';
import { fakeRunApi } from '../testing/fake-run-api';
import { writeDrafts } from '../utils/write-drafts';
import { createOutbox, type OutboxOptions } from './outbox-engine';

const ROBIN = { id: 1, name: 'Robin Vale' };
const runPath = `/api/runs/${RUN_ID}`;
const outboxes: ReturnType<typeof createOutbox>[] = [];

function anOutbox(options: Partial<OutboxOptions> & Pick<OutboxOptions, 'store'>) {
  const outbox = createOutbox({ send: sendWrite, currentUser: () => ROBIN, delayMs: () => 10, ...options });
  outboxes.push(outbox);
  return outbox;
}

afterEach(() => {
  outboxes.splice(0).forEach((o) => o.dispose());
});

describe('outbox', () => {
  it('when writes are made offline, then they are kept in order and each is sent once with its Idempotency-Key when back online', async () => {
    // The timer write meets a 503 once: it is tried again with the same key and recorded once.
    const api = fakeRunApi(() => aRun(), (write, attempt) => (write.path.endsWith('/timers') && attempt === 1 ? new HttpResponse(null, { status: 503 }) : { id: 40 + api.recorded.length }));
    server.use(...api.handlers);
    let isOnline = false;
    const store = createMemoryBenchStore({ isDurable: true });
    const outbox = anOutbox({ store, isOnline: () => isOnline });

    await outbox.enqueue(writeDrafts.acknowledgeSafety(RUN_ID, CURE_STEP_ID, ['hot-surface']));
    await outbox.enqueue(writeDrafts.startStep(RUN_ID, CURE_STEP_ID));
    await outbox.enqueue(writeDrafts.startTimer(RUN_ID, CURE_STEP_ID, 'Cure', 1800));
    const kept = await store.listWrites();
    expect(kept.map((i) => i.kind)).toEqual(['acknowledge-safety', 'start-step', 'start-timer']);
    expect(api.seen).toHaveLength(0);

    isOnline = true;
    outbox.retryNow();
    await vi.waitFor(() => expect(outbox.getState().phase).toBe('idle'));

    expect(api.recorded.map((w) => w.path)).toEqual([`${runPath}/steps/${CURE_STEP_ID}/acknowledge-safety`, `${runPath}/steps/${CURE_STEP_ID}/start`, `${runPath}/timers`]);
    expect(api.recorded.map((w) => w.key)).toEqual(kept.map((i) => i.idempotencyKey));
    expect(api.seen.filter((w) => w.path.endsWith('/timers')).map((w) => w.key)).toEqual([kept[2]?.idempotencyKey, kept[2]?.idempotencyKey]);
    expect(api.recorded[2]?.body).toMatchObject({ stepId: CURE_STEP_ID, plannedSeconds: 1800, madeOffline: true, deviceTime: kept[2]?.createdAt });
  });

  it('when the page reloads, then the waiting writes come back from storage in order and go out', async () => {
    const api = fakeRunApi(() => aRun());
    server.use(...api.handlers);
    const store = createMemoryBenchStore({ isDurable: true });
    const before = anOutbox({ store, isOnline: () => false });
    await before.enqueue(writeDrafts.startStep(RUN_ID, CURE_STEP_ID));
    await before.enqueue(writeDrafts.completeStep(RUN_ID, CURE_STEP_ID));
    before.dispose();

    const after = anOutbox({ store, isOnline: () => true });
    await after.load();
    expect(after.getState().items.map((i) => i.kind)).toEqual(['start-step', 'complete-step']);
    await after.drain();

    expect(api.recorded.map((w) => w.path.split('/').pop())).toEqual(['start', 'complete']);
  });

  it('when the page is handed the writes its loader read, then it shows them at once without reading the store again, and sends them', async () => {
    const api = fakeRunApi(() => aRun());
    server.use(...api.handlers);
    const store = createMemoryBenchStore({ isDurable: true });
    const before = anOutbox({ store, isOnline: () => false });
    await before.enqueue(writeDrafts.startStep(RUN_ID, CURE_STEP_ID));
    before.dispose();
    const read = await store.listWrites();
    const listWrites = vi.spyOn(store, 'listWrites');

    const after = anOutbox({ store, isOnline: () => true, initialItems: read });
    expect(after.getState()).toMatchObject({ isLoaded: true, items: read });
    await after.drain();

    expect(listWrites).not.toHaveBeenCalled();
    expect(api.recorded.map((w) => w.path.split('/').pop())).toEqual(['start']);
  });

  it('when the server refuses a write, then it stops there, later writes wait, and dropping it lets them go', async () => {
    const api = fakeRunApi(() => aRun(), (write) => (write.path.endsWith('/start') ? HttpResponse.json({ error: { code: 'FORBIDDEN', message: 'Operators only.' } }, { status: 403 }) : { id: 1 }));
    server.use(...api.handlers);
    const outbox = anOutbox({ store: createMemoryBenchStore(), isOnline: () => true });

    const refused = await outbox.enqueue(writeDrafts.startStep(RUN_ID, CURE_STEP_ID));
    await outbox.enqueue(writeDrafts.acknowledgeSafety(RUN_ID, CURE_STEP_ID, []));
    await vi.waitFor(() => expect(outbox.getState().phase).toBe('blocked'));
    expect(outbox.getState().lastError?.message).toBe('Operators only.');
    expect(api.recorded).toHaveLength(0);

    await outbox.discard(refused.id);
    await vi.waitFor(() => expect(api.recorded.map((w) => w.path.split('/').pop())).toEqual(['acknowledge-safety']));
  });

  it('when another tablet completed the step first (409), then the write is dropped with a notice and the next goes out', async () => {
    const api = fakeRunApi(() => aRun(), (write) => (write.path.endsWith('/complete') ? HttpResponse.json({ error: { code: 'CONFLICT', message: 'Mika Sato completed this step at 10:05.' } }, { status: 409 }) : { id: 1 }));
    server.use(...api.handlers);
    const outbox = anOutbox({ store: createMemoryBenchStore(), isOnline: () => true });

    await outbox.enqueue(writeDrafts.completeStep(RUN_ID, CURE_STEP_ID));
    await outbox.enqueue(writeDrafts.holdRun(RUN_ID, 'Oven door seal torn'));
    await vi.waitFor(() => expect(outbox.getState().phase).toBe('idle'));

    expect(outbox.getState().notices).toEqual([expect.objectContaining({ kind: 'complete-step', message: 'Mika Sato completed this step at 10:05.' })]);
    expect(api.recorded.map((w) => w.path.split('/').pop())).toEqual(['hold']);
    expect(outbox.getState().items.every((i) => i.status === 'sent')).toBe(true);
  });

  it('when a timer started offline is stopped offline, then the stop goes to the id the server gave the timer', async () => {
    const api = fakeRunApi(() => aRun(), (write) => (write.path.endsWith('/timers') ? { id: 55, stepId: CURE_STEP_ID } : { id: 55 }));
    server.use(...api.handlers);
    let isOnline = false;
    const outbox = anOutbox({ store: createMemoryBenchStore(), isOnline: () => isOnline });

    const start = await outbox.enqueue(writeDrafts.startTimer(RUN_ID, CURE_STEP_ID, 'Cure', 1800));
    await outbox.enqueue(writeDrafts.stopTimer(RUN_ID, CURE_STEP_ID, start.id, 'Oven tripped'));
    isOnline = true;
    await outbox.drain();

    expect(api.recorded.map((w) => w.path)).toEqual([`${runPath}/timers`, `${runPath}/timers/55/stop`]);
    expect(api.recorded[1]?.body).toMatchObject({ reason: 'Oven tripped' });
  });

  it('when a problem is reported offline with a photo, then the photo is uploaded first and the report names its file', async () => {
    const api = fakeRunApi(() => aRun(), (write) => (write.path === '/api/files/photos' ? { id: 900 } : { id: 12 }));
    server.use(...api.handlers);
    let isOnline = false;
    const outbox = anOutbox({ store: createMemoryBenchStore(), isOnline: () => isOnline });

    const photo = await outbox.enqueue(writeDrafts.uploadPhoto(RUN_ID, null, new Blob(['jpeg bytes'], { type: 'image/jpeg' })));
    await outbox.enqueue(writeDrafts.reportProblem(RUN_ID, { stepId: null, pieceIds: [101], description: 'Trace lifted at the bend', severity: 'major' }, [photo.id]));
    isOnline = true;
    await outbox.drain();

    expect(api.recorded.map((w) => w.path)).toEqual(['/api/files/photos', `${runPath}/problems`]);
    expect(api.recorded[1]?.body).toMatchObject({ photoFileIds: [900], pieceIds: [101], severity: 'major' });
  });
});
