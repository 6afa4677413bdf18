import type { ChildProcess } from 'node:child_process';

import type { MariadbInstance } from '../lib/mariadb';
import { killDatabase, RECOVERY_LIMIT_MS, type Outage } from './database-outage';
import { deliver, type WriteOutcome } from './outbox-client';
import { planRound, type PlannedWrite } from './round-plan';
import { auditHighWater, verifyRound, type RoundCheck } from './round-verify';
import { HANG_MS, type Attempt, type TabletSession } from './tablet-session';

export interface RoundSetup {
  round: number;
  db: MariadbInstance;
  baseUrl: string;
  server: ChildProcess;
  planner: TabletSession;
  operators: TabletSession[];
  /** Ten writes per run: five step completions, five readings. */
  runCount: number;
}

export interface RoundResult extends RoundCheck {
  round: number;
  writes: number;
  acknowledged: number;
  /** Acknowledgements that were a stored answer replayed: the first try was done, its answer lost. */
  replays: number;
  /** Writes that needed more than one try. */
  retried: number;
  killAfterAcks: number;
  inFlightAtKill: number;
  downMs: number;
  restartMs: number;
  recoveryMs: number | null;
  /** Answers to the writes by status (every try). */
  statuses: Record<string, number>;
  /** Answers of GET /api/health during and after the outage. */
  healthStatuses: Record<string, number>;
  unavailableDuringOutage: number;
  slowestMs: number;
  setupMs: number;
  durationMs: number;
  problems: string[];
}

/**
 * One round: the tablets send every write at once; after a share of them is acknowledged the
 * database is killed, kept down, restarted; the tablets keep retrying until all are acknowledged;
 * then the database is checked against the acknowledgements.
 */
export async function runKillRound(setup: RoundSetup): Promise<RoundResult> {
  const start = Date.now();
  const { round, db } = setup;
  const plan = await planRound(db, round, setup.runCount, setup.planner, setup.operators);
  const auditFrom = auditHighWater(db);
  const setupMs = Date.now() - start;
  const writes = plan.writes.length;
  // Somewhere between a fifth and three fifths of the way, spread over the rounds (golden-ratio steps).
  const killAfterAcks = Math.round(writes * (0.2 + 0.4 * ((round * 0.618034) % 1)));
  const downMs = 1_500 + ((round * 3) % 5) * 500;
  const sent = await sendWithKill(setup, plan.writes, killAfterAcks, downMs, start + 120_000);
  const happened = sent.outage instanceof Error ? null : sent.outage;
  const problems = roundProblems(setup, sent.outage, sent.outcomes);
  const attempts = sent.outcomes.flatMap((o) => o.attempts);
  const check = verifyRound(db, round, plan.runIds, sent.outcomes, auditFrom);
  problems.push(...check.problems);
  const during = happened ? attempts.filter((a) => a.endedAt >= happened.killedAt && a.endedAt <= happened.backAt) : [];
  return {
    ...check,
    round,
    writes,
    acknowledged: sent.outcomes.filter((o) => o.acknowledged).length,
    replays: sent.outcomes.filter((o) => o.acknowledged?.isReplay).length,
    retried: sent.outcomes.filter((o) => o.attempts.length > 1).length,
    killAfterAcks,
    inFlightAtKill: sent.inFlightAtKill,
    downMs: happened ? happened.backAt - happened.killedAt : 0,
    restartMs: happened?.restartMs ?? 0,
    recoveryMs: happened?.recoveredAt ? happened.recoveredAt - happened.backAt : null,
    statuses: statusCounts(attempts),
    healthStatuses: statusCounts([...(happened?.healthProbes ?? []), ...(happened?.recoveryProbes ?? [])]),
    unavailableDuringOutage: during.filter((a) => a.status === 503).length,
    slowestMs: Math.max(0, ...attempts.map((a) => a.endedAt - a.startedAt)),
    setupMs,
    durationMs: Date.now() - start,
    problems,
  };
}

/** Sends every write at once; the `killAfterAcks`-th acknowledgement sets off the outage. */
async function sendWithKill(setup: RoundSetup, writes: PlannedWrite[], killAfterAcks: number, downMs: number, deadline: number) {
  let acks = 0;
  let inFlightAtKill = 0;
  let outage: Promise<Outage | Error> | null = null;
  const outcomes = await Promise.all(
    writes.map((write) =>
      deliver(write, deadline, () => {
        acks += 1;
        if (acks !== killAfterAcks) return;
        inFlightAtKill = writes.length - acks;
        // Caught at once: a failed restart must fail the round, not crash this process unawaited.
        outage = killDatabase(setup.db, setup.baseUrl, downMs).catch((error: unknown) => (error instanceof Error ? error : new Error(String(error))));
      }),
    ),
  );
  const settled = await (outage as Promise<Outage | Error> | null);
  return { outcomes, inFlightAtKill, outage: settled ?? new Error(`the database was never killed (${acks} of ${writes.length} acknowledged)`) };
}

/** Everything wrong with the round apart from the data: the fault, the recovery, the answers. */
function roundProblems(setup: RoundSetup, outage: Outage | Error, outcomes: WriteOutcome[]): string[] {
  const problems: string[] = [];
  if (outage instanceof Error) problems.push(`the outage went wrong: ${outage.message}`);
  const happened = outage instanceof Error ? null : outage;
  if (happened && !happened.wasKilledHard) problems.push('mariadbd did not die of SIGKILL');
  if (happened && happened.recoveredAt === null) problems.push(`GET /api/health did not answer 200 within ${RECOVERY_LIMIT_MS / 1000} s of the restart`);
  if (setup.server.exitCode !== null || setup.server.signalCode !== null) problems.push('the server process died');
  problems.push(...outcomes.flatMap((o) => (o.failure ? [`${o.write.kind} ${o.write.key}: ${o.failure}`] : [])));
  problems.push(...answerProblems(outcomes.flatMap((o) => o.attempts), happened));
  return problems;
}

/**
 * What the API may say: 2xx, or 503 with a Retry-After while the database is away. Never 500,
 * never a dropped connection, never silence past HANG_MS. The outage must have been seen: at
 * least one write and the health check answered 503 while the database was down.
 */
function answerProblems(attempts: Attempt[], outage: Outage | null): string[] {
  const problems: string[] = [];
  const bad = attempts.filter((a) => !(a.status >= 200 && a.status < 300) && a.status !== 503);
  for (const a of bad.slice(0, 5)) problems.push(`answer ${a.status} after ${a.endedAt - a.startedAt} ms: ${a.error ?? JSON.stringify(a.body).slice(0, 200)}`);
  if (bad.length > 5) problems.push(`… and ${bad.length - 5} more answers that were neither 2xx nor 503`);
  const bare = attempts.filter((a) => a.status === 503 && !a.retryAfter).length;
  if (bare > 0) problems.push(`${bare} answers were 503 without a Retry-After`);
  const slow = attempts.filter((a) => a.endedAt - a.startedAt > HANG_MS).length;
  if (slow > 0) problems.push(`${slow} requests took longer than ${HANG_MS / 1000} s`);
  if (!outage) return problems;
  const during = attempts.filter((a) => a.endedAt >= outage.killedAt && a.endedAt <= outage.backAt);
  if (!during.some((a) => a.status === 503)) problems.push('no write was answered 503 while the database was down');
  const health = outage.healthProbes;
  if (health.length === 0 || health.some((p) => p.status !== 503 || !p.retryAfter)) {
    problems.push(`GET /api/health during the outage answered ${JSON.stringify(health.map((p) => p.status))}, expected 503 with Retry-After each time`);
  }
  return problems;
}

function statusCounts(attempts: Attempt[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const a of attempts) {
    const label = a.status === 0 ? 'network-error' : a.status === -1 ? 'timeout' : String(a.status);
    counts[label] = (counts[label] ?? 0) + 1;
  }
  return counts;
}
