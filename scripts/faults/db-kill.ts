/**
 * Database killed mid-write: simulated tablets send step completions and readings at once;
 * part-way, mariadbd dies of SIGKILL and is restarted; the tablets retry with their keys. Then
 * every acknowledged write must be in the database once, with its audit row.
 *
 *   tsx scripts/faults/db-kill.ts [--rounds=3] [--runs=20] [--report=file.json] [--keep-log]
 *
 * Exit code 0 only when every round passed. The report (JSON) feeds `npm test`'s tally.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';

import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../backend/src/seed/demo-people';
import { ROOT } from '../lib/paths';
import { startFaultStack } from './fault-stack';
import { roundLine, seconds, type FaultReport } from './fault-report';
import { runKillRound } from './kill-round';
import { signIn } from './tablet-session';

const SERVER_LOG = join(ROOT, '.tmp', 'faults', 'server.log');

function argument(name: string, fallback: string): string {
  return process.argv.find((a) => a.startsWith(`--${name}=`))?.split('=')[1] ?? fallback;
}

const account = (prefix: string) => {
  const person = DEMO_PEOPLE.find((p) => p.email.startsWith(`${prefix}@`));
  if (!person) throw new Error(`The demo lab has no ${prefix}.`);
  return person.email;
};

async function main(): Promise<number> {
  const rounds = Number(argument('rounds', '3'));
  const runCount = Number(argument('runs', '20'));
  const reportFile = argument('report', '');
  const start = Date.now();
  const report: FaultReport = { rounds: [], passed: 0, failed: 0, error: null, durationMs: 0 };
  console.log(`[faults] Database killed mid-write: ${rounds} rounds of ${runCount * 10} writes…`);
  const stack = await startFaultStack();
  try {
    const planner = await signIn(stack.baseUrl, account('engineer'), DEMO_PASSWORD);
    const operators = await Promise.all(['operator', 'operator2'].map((p) => signIn(stack.baseUrl, account(p), DEMO_PASSWORD)));
    for (let round = 1; round <= rounds; round += 1) {
      const result = await runKillRound({ round, db: stack.db.instance, baseUrl: stack.baseUrl, server: stack.server, planner, operators, runCount });
      report.rounds.push(result);
      console.log(roundLine(result, rounds));
      if (result.problems.length === 0) continue;
      for (const problem of result.problems.slice(0, 15)) console.log(`[faults]   ${problem}`);
      if (result.problems.length > 15) console.log(`[faults]   … ${result.problems.length - 15} more`);
      console.log(`[faults]   errors in the server log:\n${stack.logErrors()}`);
      if (stack.server.exitCode !== null) break;
    }
  } catch (error) {
    report.error = error instanceof Error ? (error.stack ?? error.message) : String(error);
    console.error(`[faults] ${report.error}\n${stack.logErrors()}`);
  } finally {
    const keepLog = process.argv.includes('--keep-log') || report.error !== null || report.rounds.some((r) => r.problems.length > 0);
    await stack.close(keepLog ? SERVER_LOG : undefined);
    if (keepLog) console.log(`[faults] The server's log is kept in ${SERVER_LOG}.`);
  }
  report.passed = report.rounds.filter((r) => r.problems.length === 0).length;
  // Rounds that never ran (the stack broke) count as failed.
  report.failed = rounds - report.passed;
  report.durationMs = Date.now() - start;
  if (reportFile) {
    mkdirSync(dirname(reportFile), { recursive: true });
    writeFileSync(reportFile, JSON.stringify(report, null, 2));
  }
  console.log(`[faults] ${report.passed} passed, ${report.failed} failed in ${seconds(report.durationMs)}`);
  return report.failed === 0 ? 0 : 1;
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
