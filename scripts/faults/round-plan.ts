import { randomBytes } from 'node:crypto';

import type { MariadbInstance } from '../lib/mariadb';
import { postOnce, type TabletSession } from './tablet-session';

/** The demo lab's recipe and lots the fault runs use (seeded by migrateAndSeed). */
const RECIPE_CODE = 'TOUCH-4K';
const LOT_NUMBERS = ['QS30-2611', 'FM-PET-1208'];
/** Steps the tablets complete during the round; the inspection stays open for the readings. */
const STEPS_TO_COMPLETE = ['wipe-pet', 'print-keys', 'dry-keys', 'cure-keys', 'attach-tail'];
const INSPECT_STEP = 'inspect-keys';
const READING_SPEC = 'r-key-1';

/** One write a tablet must get acknowledged during the round. */
export interface PlannedWrite {
  kind: 'step-completion' | 'reading';
  key: string;
  session: TabletSession;
  runId: number;
  stepId: string;
  pieceId: number | null;
  /** The reading's value; for completions, the note carries the key so the row can be traced. */
  value: number | null;
  path: string;
  body: Record<string, unknown>;
}

export interface RoundPlan {
  runIds: number[];
  writes: PlannedWrite[];
}

/** Reads one column of one row as root, straight from the database (not through the app). */
export function sqlValue(db: MariadbInstance, sql: string): string {
  return db.rootSql(sql).trim();
}

/**
 * Plans `runCount` runs through the API and starts their steps, so each run has five steps an
 * operator can complete and five pieces to measure: ten writes per run, none depending on another.
 */
export async function planRound(db: MariadbInstance, round: number, runCount: number, planner: TabletSession, operators: TabletSession[]): Promise<RoundPlan> {
  const database = 'tracewright_test';
  const versionId = Number(
    sqlValue(db, `SELECT v.id FROM ${database}.recipe_versions v JOIN ${database}.recipes r ON r.id = v.recipe_id WHERE r.code = '${RECIPE_CODE}' AND v.state = 'released' ORDER BY v.number LIMIT 1`),
  );
  const lotIds = sqlValue(db, `SELECT id FROM ${database}.material_lots WHERE lot_number IN (${LOT_NUMBERS.map((n) => `'${n}'`).join(', ')})`)
    .split('\n')
    .map(Number);
  if (!versionId || lotIds.length !== LOT_NUMBERS.length) throw new Error(`The demo lab lacks ${RECIPE_CODE} or its lots: was it seeded?`);
  const runs = await Promise.all(
    Array.from({ length: runCount }, (_, i) => planRun(planner, { versionId, quantity: 5, lots: lotIds.map((lotId) => ({ lotId })), notes: `Fault round ${round}, run ${i + 1}` })),
  );
  const writes: PlannedWrite[] = [];
  await Promise.all(
    runs.map(async (run, i) => {
      const session = operators[i % operators.length] as TabletSession;
      for (const stepId of [...STEPS_TO_COMPLETE, INSPECT_STEP]) await startStep(session, run.id, stepId);
      writes.push(...runWrites(round, run, session));
    }),
  );
  return { runIds: runs.map((r) => r.id), writes };
}

const newKey = (round: number) => `fault-r${round}-${randomBytes(8).toString('hex')}`;

function runWrites(round: number, run: PlannedRun, session: TabletSession): PlannedWrite[] {
  const completions = STEPS_TO_COMPLETE.map((stepId): PlannedWrite => {
    const key = newKey(round);
    return { kind: 'step-completion', key, session, runId: run.id, stepId, pieceId: null, value: null, path: `/api/runs/${run.id}/steps/${stepId}/complete`, body: { note: `Done (${key})` } };
  });
  // In limits (3–9 Ω) and distinct per piece, so a reading row can be matched to the write that made it.
  const readings = run.pieceIds.map((pieceId, p): PlannedWrite => {
    const value = Number((4 + p * 0.25 + (run.id % 100) * 0.001).toFixed(3));
    const body = { stepId: INSPECT_STEP, specId: READING_SPEC, pieceId, value };
    return { kind: 'reading', key: newKey(round), session, runId: run.id, stepId: INSPECT_STEP, pieceId, value, path: `/api/runs/${run.id}/readings`, body };
  });
  return [...completions, ...readings];
}

interface PlannedRun {
  id: number;
  pieceIds: number[];
}

async function planRun(planner: TabletSession, body: object): Promise<PlannedRun> {
  const res = await postOnce(planner, '/api/runs', body);
  if (res.status !== 201) throw new Error(`Planning a fault run failed: ${res.status} ${JSON.stringify(res.body)}`);
  const run = res.body as { id: number; pieces: Array<{ id: number }> };
  return { id: run.id, pieceIds: run.pieces.map((p) => p.id) };
}

/** Setup, before any fault: acknowledging the safety card and starting must simply work. */
async function startStep(session: TabletSession, runId: number, stepId: string): Promise<void> {
  for (const action of ['acknowledge-safety', 'start']) {
    const res = await postOnce(session, `/api/runs/${runId}/steps/${stepId}/${action}`, {});
    if (res.status !== 200) throw new Error(`Setup ${action} of ${stepId} on run ${runId} failed: ${res.status} ${JSON.stringify(res.body)}`);
  }
}
