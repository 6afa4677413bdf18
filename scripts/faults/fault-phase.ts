import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';

import { BIN, ROOT } from '../lib/paths';
import type { FaultReport } from './fault-report';

/**
 * Runs the database-kill rounds in a process of their own (they start their own MariaDB and
 * server) and returns one passed or failed per round, as `npm test` and `npm run test:long` tally.
 */
export function runFaultPhase(rounds: number, reportFile: string): { passed: number; failed: number } {
  console.log(`\n[test] Database faults (${rounds} rounds)…`);
  rmSync(reportFile, { force: true });
  const result = spawnSync(BIN('tsx'), [join(ROOT, 'scripts', 'faults', 'db-kill.ts'), `--rounds=${rounds}`, `--report=${reportFile}`], {
    cwd: ROOT,
    stdio: 'inherit',
  });
  if (!existsSync(reportFile)) return { passed: 0, failed: Math.max(rounds, 1) };
  const report = JSON.parse(readFileSync(reportFile, 'utf8')) as FaultReport;
  // A crash after the last round (say, while stopping) still fails the phase.
  const crashed = result.status !== 0 && report.failed === 0 ? 1 : 0;
  return { passed: report.passed, failed: report.failed + crashed };
}
