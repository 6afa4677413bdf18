import type { RunDetail, StepRecordView } from '@tracewright/shared';

import type { OutboxItem } from '../outbox/outbox-types';
import { recordOf, type BenchDeviation, type BenchReading, type BenchRun } from './bench-run';

type Str = string | null;
const str = (value: unknown): Str => (typeof value === 'string' ? value : null);
const num = (value: unknown): number | null => (typeof value === 'number' ? value : null);
const who = (item: OutboxItem) => ({ id: item.userId, name: item.userName });
const localId = (item: OutboxItem) => -item.seq;
const matches = (target: unknown, record: { id: number; localRef: string | null }) => target === record.id || (typeof target === 'string' && target === record.localRef);

function patchStep(run: BenchRun, stepId: Str, patch: (record: StepRecordView) => StepRecordView | null): BenchRun {
  if (stepId === null) return run;
  const record = recordOf(run, stepId);
  const next = patch(record);
  if (!next) return run;
  const others = run.steps.filter((r) => r.stepId !== stepId);
  return { ...run, steps: [...others, next] };
}

/** A pending write already in the server's answer (sent, and fetched since) is not added twice. */
const alreadyThere = (item: OutboxItem, ids: number[]) => item.resultId !== null && ids.includes(item.resultId);

function newReading(item: OutboxItem, base: Partial<BenchReading>): BenchReading {
  const body = item.body ?? {};
  const meta = item.meta;
  return {
    id: localId(item),
    stepId: str(body.stepId) ?? item.stepId ?? '',
    specId: str(body.specId) ?? '',
    pieceId: num(body.pieceId),
    value: num(body.value) ?? 0,
    unit: str(meta.unit) ?? '',
    correctedValue: num(meta.correctedValue),
    ambientTempC: num(body.ambientTempC),
    instrumentId: num(body.instrumentId),
    outOfLimits: meta.outOfLimits === true,
    recordedAt: item.createdAt,
    recordedBy: who(item),
    supersededById: null,
    correctionReason: null,
    localRef: item.id,
    isPending: item.status !== 'sent',
    ...base,
  };
}

type Apply = (run: BenchRun, item: OutboxItem, clockOffsetMs: number) => BenchRun;

const APPLY: Partial<Record<OutboxItem['kind'], Apply>> = {
  'acknowledge-safety': (run, item) => patchStep(run, item.stepId, (r) => (r.safetyAcknowledgedAt ? null : { ...r, safetyAcknowledgedAt: item.createdAt, safetyAcknowledgedBy: who(item) })),
  'start-step': (run, item) => patchStep(run, item.stepId, (r) => (r.state !== 'pending' ? null : { ...r, state: 'in-progress', startedAt: item.createdAt, startedBy: who(item) })),
  'complete-step': (run, item) => patchStep(run, item.stepId, (r) => (r.state === 'done' || r.state === 'not-done' ? null : { ...r, state: 'done', completedAt: item.createdAt, completedBy: who(item) })),
  'step-not-done': (run, item) => patchStep(run, item.stepId, (r) => (r.state === 'done' || r.state === 'not-done' ? null : { ...r, state: 'not-done', completedAt: item.createdAt, completedBy: who(item), notDoneReason: str(item.body?.reason) })),
  'confirm-lot': (run, item) => {
    const lotId = num(item.body?.lotId);
    return patchStep(run, item.stepId, (r) => (lotId === null || r.confirmedLotIds.includes(lotId) ? null : { ...r, confirmedLotIds: [...r.confirmedLotIds, lotId] }));
  },
  'nozzle-check': (run, item) =>
    patchStep(run, item.stepId, (r) => (item.status === 'sent' && r.nozzleCheck ? null : { ...r, nozzleCheck: { passed: item.body?.passed === true, photoFileId: null, at: item.createdAt } })),
  'start-timer': (run, item) => {
    const serverTimer = run.timers.find((t) => item.resultId !== null && t.id === item.resultId);
    if (serverTimer) return { ...run, timers: run.timers.map((t) => (t === serverTimer ? { ...t, localRef: item.id, alarmKey: item.id } : t)) };
    const body = item.body ?? {};
    // Until the server answers, the timer runs on this tablet's clock from the moment it was started.
    const timer = { id: localId(item), stepId: item.stepId ?? '', label: str(body.label) ?? '', plannedSeconds: num(body.plannedSeconds) ?? 0, startedAt: item.createdAt, stoppedAt: null, startedOnDeviceClock: true, startedBy: who(item), localRef: item.id, alarmKey: item.id, isPending: true };
    return { ...run, timers: [...run.timers, timer] };
  },
  'stop-timer': (run, item, clockOffsetMs) => {
    // A server-started timer is read on the server's clock: stop it on that clock too.
    const stoppedAt = (t: { startedOnDeviceClock: boolean }) => (t.startedOnDeviceClock ? item.createdAt : new Date(Date.parse(item.createdAt) + clockOffsetMs).toISOString());
    return { ...run, timers: run.timers.map((t) => (matches(item.meta.target, t) && t.stoppedAt === null ? { ...t, stoppedAt: stoppedAt(t) } : t)) };
  },
  'record-reading': (run, item) => (alreadyThere(item, run.readings.map((r) => r.id)) ? run : { ...run, readings: [...run.readings, newReading(item, {})] }),
  'correct-reading': (run, item) => {
    if (alreadyThere(item, run.readings.map((r) => r.id))) return run;
    const original = run.readings.find((r) => matches(item.meta.target, r));
    if (!original) return run;
    const corrected = newReading(item, { stepId: original.stepId, specId: original.specId, pieceId: original.pieceId, unit: original.unit, ambientTempC: original.ambientTempC, instrumentId: original.instrumentId, correctionReason: str(item.body?.reason) });
    const readings = run.readings.map((r) => (r === original ? { ...r, supersededById: corrected.id } : r));
    return { ...run, readings: [...readings, corrected] };
  },
  'report-problem': (run, item) => {
    if (alreadyThere(item, run.deviations.map((d) => d.id))) return run;
    const body = item.body ?? {};
    const description = str(body.description) ?? '';
    const severity: BenchDeviation['severity'] = body.severity === 'major' || body.severity === 'critical' ? body.severity : 'minor';
    const pieceIds = Array.isArray(body.pieceIds) ? body.pieceIds.filter((id): id is number => typeof id === 'number') : [];
    const deviation: BenchDeviation = { id: localId(item), runId: run.id, stepId: item.stepId, rule: 'reported' as const, severity, state: 'open' as const, title: description.slice(0, 120), expected: '', actual: description, pieceIds, photoFileIds: [], createdAt: item.createdAt, createdBy: who(item), isPending: item.status !== 'sent' };
    return { ...run, deviations: [...run.deviations, deviation] };
  },
  'hold-run': (run, item) => (item.status === 'sent' || run.state !== 'in-progress' ? run : { ...run, state: 'on-hold', holdReason: str(item.body?.reason) }),
  'resume-run': (run, item) => (item.status === 'sent' || run.state !== 'on-hold' ? run : { ...run, state: 'in-progress', holdReason: null }),
};

/**
 * The run as the operator should see it: the server's last answer with every write still in
 * the outbox (or sent but not yet fetched back) applied in order. Refused writes are left out;
 * the outbox panel shows them. State only moves forward, so a late overlay never undoes
 * what another tablet did since.
 */
export function applyWrites(run: RunDetail, items: readonly OutboxItem[], clockOffsetMs = 0): BenchRun {
  const sentStarts = new Map(items.filter((i) => i.kind === 'start-timer' && i.resultId !== null).map((i) => [i.resultId, i.id]));
  let bench: BenchRun = {
    ...run,
    timers: run.timers.map((t) => ({ ...t, localRef: sentStarts.get(t.id) ?? null, alarmKey: sentStarts.get(t.id) ?? `srv:${t.id}`, isPending: false })),
    readings: run.readings.map((r) => ({ ...r, localRef: null, isPending: false })),
    deviations: run.deviations.map((d) => ({ ...d, isPending: false })),
  };
  for (const item of items) {
    if (item.runId !== run.id || item.status === 'failed') continue;
    bench = APPLY[item.kind]?.(bench, item, clockOffsetMs) ?? bench;
  }
  return bench;
}
