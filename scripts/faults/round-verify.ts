import type { MariadbInstance } from '../lib/mariadb';
import type { WriteOutcome } from './outbox-client';

const DB = 'tracewright_test';
/** The audit actions the round's writes make; any other action appearing during the round is unexplained. */
const ROUND_ACTIONS = ['run-step.completed', 'run-reading.recorded'];

/** Rows as root reads them (tab-separated, NULL spelled out): the check does not trust the app's models. */
function rows(db: MariadbInstance, sql: string): string[][] {
  const text = db.rootSql(sql).trimEnd();
  return text === '' ? [] : text.split('\n').map((line) => line.split('\t'));
}

/** The highest audit row id now: rows above it were written by the round. */
export function auditHighWater(db: MariadbInstance): number {
  return Number(rows(db, `SELECT COALESCE(MAX(id), 0) FROM ${DB}.audit_events`)[0]?.[0] ?? 0);
}

const countBy = <T>(items: T[], keyOf: (item: T) => string) => {
  const counts = new Map<string, number>();
  for (const item of items) counts.set(keyOf(item), (counts.get(keyOf(item)) ?? 0) + 1);
  return counts;
};

/** What the database holds against what the tablets were told. */
export interface RoundCheck {
  /** Acknowledged writes with no row. */
  lost: number;
  /** Acknowledged writes with more than one row. */
  duplicated: number;
  /** Acknowledged writes without exactly one audit row. */
  auditMismatches: number;
  problems: string[];
}

/**
 * Checks the database against what the tablets were told: each acknowledged write is there once,
 * with its audit row and its key; nothing is there that no tablet asked for.
 */
export function verifyRound(db: MariadbInstance, round: number, runIds: number[], outcomes: WriteOutcome[], auditFrom: number): RoundCheck {
  const problems: string[] = [];
  const tally = { lost: 0, duplicated: 0, auditMismatches: 0 };
  const runs = runIds.join(', ');
  const closedSteps = rows(db, `SELECT run_id, step_id, state, completed_by, note FROM ${DB}.run_step_records WHERE run_id IN (${runs}) AND state IN ('done', 'not-done')`);
  const readings = rows(db, `SELECT id, run_id, piece_id, spec_id, value, recorded_by FROM ${DB}.run_readings WHERE run_id IN (${runs})`);
  const audits = rows(
    db,
    `SELECT id, action, entity_type, entity_id, JSON_VALUE(after_json, '$.stepId'), JSON_VALUE(after_json, '$.note') FROM ${DB}.audit_events WHERE id > ${auditFrom}`,
  );
  const keys = rows(db, `SELECT user_id, idempotency_key, COALESCE(status_code, 'NULL') FROM ${DB}.idempotency_keys WHERE idempotency_key LIKE 'fault-r${round}-%'`);

  const stepAudits = countBy(audits.filter((a) => a[1] === 'run-step.completed'), (a) => `${a[3]}/${a[4]}/${a[5]}`);
  const readingAudits = countBy(audits.filter((a) => a[1] === 'run-reading.recorded'), (a) => String(a[3]));
  const keyRows = countBy(keys, (k) => `${k[0]}/${k[1]}`);

  for (const { write, acknowledged } of outcomes) {
    if (!acknowledged) continue;
    const label = `${write.kind} ${write.key} (run ${write.runId}, ${write.stepId})`;
    const keyCount = keyRows.get(`${write.session.userId}/${write.key}`) ?? 0;
    if (keyCount !== 1) problems.push(`${label}: ${keyCount} key rows, expected 1`);
    if (write.kind === 'step-completion') {
      const note = String(write.body.note);
      const found = closedSteps.filter((s) => s[0] === String(write.runId) && s[1] === write.stepId);
      if (found.length === 0) tally.lost += 1;
      if (found.length !== 1 || found[0]?.[2] !== 'done' || found[0]?.[3] !== String(write.session.userId) || found[0]?.[4] !== note) {
        problems.push(`${label}: acknowledged, but its step record is ${JSON.stringify(found)}`);
      }
      const auditCount = stepAudits.get(`${write.runId}/${write.stepId}/${note}`) ?? 0;
      if (auditCount !== 1) {
        tally.auditMismatches += 1;
        problems.push(`${label}: ${auditCount} audit rows, expected 1`);
      }
    } else {
      const found = readings.filter((r) => r[1] === String(write.runId) && r[2] === String(write.pieceId));
      const answeredId = String((acknowledged.body as { reading?: { id?: number } } | null)?.reading?.id);
      if (found.length === 0) tally.lost += 1;
      if (found.length > 1) tally.duplicated += 1;
      if (found.length !== 1 || Number(found[0]?.[4]) !== write.value || found[0]?.[5] !== String(write.session.userId)) {
        problems.push(`${label}: acknowledged, but ${found.length} reading rows match it: ${JSON.stringify(found)}`);
      } else if (found[0]?.[0] !== answeredId) {
        problems.push(`${label}: the answer named reading ${answeredId}, the database holds ${found[0]?.[0]}`);
      }
      const auditCount = readingAudits.get(answeredId) ?? 0;
      if (auditCount !== 1) {
        tally.auditMismatches += 1;
        problems.push(`${label}: ${auditCount} audit rows, expected 1`);
      }
    }
  }
  problems.push(...unrequested(outcomes, closedSteps, readings, audits, keys));
  return { ...tally, problems };
}

/** Rows no tablet asked for: extra step closures, readings, audit rows or keys. */
function unrequested(outcomes: WriteOutcome[], closedSteps: string[][], readings: string[][], audits: string[][], keys: string[][]): string[] {
  const problems: string[] = [];
  const planned = outcomes.map((o) => o.write);
  const plannedSteps = new Set(planned.filter((w) => w.kind === 'step-completion').map((w) => `${w.runId}/${w.stepId}`));
  const plannedPieces = new Set(planned.filter((w) => w.kind === 'reading').map((w) => `${w.runId}/${w.pieceId}`));
  for (const s of closedSteps) if (!plannedSteps.has(`${s[0]}/${s[1]}`)) problems.push(`step ${s[1]} of run ${s[0]} is ${s[2]}, but no tablet closed it`);
  for (const r of readings) if (!plannedPieces.has(`${r[1]}/${r[2]}`)) problems.push(`reading ${r[0]} (run ${r[1]}, piece ${r[2]}) was never sent`);
  const readingIds = new Set(readings.map((r) => r[0]));
  const stepCompletions = audits.filter((a) => a[1] === 'run-step.completed').length;
  if (stepCompletions !== closedSteps.length) problems.push(`${stepCompletions} step-completion audit rows for ${closedSteps.length} completed steps`);
  for (const a of audits) {
    if (!ROUND_ACTIONS.includes(a[1] ?? '')) problems.push(`unexplained audit row ${a[0]}: ${a[1]} ${a[2]} ${a[3]}`);
    else if (a[1] === 'run-reading.recorded' && !readingIds.has(a[3] ?? '')) problems.push(`audit row ${a[0]} names reading ${a[3]}, which is not there`);
  }
  const sentKeys = new Set(planned.map((w) => `${w.session.userId}/${w.key}`));
  for (const k of keys) {
    if (!sentKeys.has(`${k[0]}/${k[1]}`)) problems.push(`key ${k[1]} is stored but was never sent`);
    if (k[2] === 'NULL') problems.push(`key ${k[1]} is stored without its answer (half-written)`);
  }
  return problems;
}
