/**
 * `npm run test:long`: the slow proofs `npm test` runs short. The hostile-input fuzz tests with
 * FUZZ_RUNS=1000 against a throwaway MariaDB, then 20 database-kill rounds. Prints one closing
 * "N passed, N failed" line; the exit code is non-zero when anything failed.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';

import { runFaultPhase } from './faults/fault-phase';
import { BIN, ROOT } from './lib/paths';
import { startThrowawayDatabase } from './lib/test-database';

const REPORT_DIR = join(ROOT, '.tmp', 'test-long-reports');
const FUZZ_DIR = join('backend', 'test', 'hostile');
const FUZZ_RUNS = '1000';
const FAULT_ROUNDS = 20;

interface Tally {
  passed: number;
  failed: number;
  skipped: number;
}

async function main(): Promise<number> {
  rmSync(REPORT_DIR, { recursive: true, force: true });
  mkdirSync(REPORT_DIR, { recursive: true });
  const start = Date.now();
  const tally: Tally = { passed: 0, failed: 0, skipped: 0 };
  await runFuzzTests(tally);
  const faults = runFaultPhase(FAULT_ROUNDS, join(REPORT_DIR, 'faults.json'));
  tally.passed += faults.passed;
  tally.failed += faults.failed;
  const minutes = ((Date.now() - start) / 60_000).toFixed(1);
  console.log(`\n${tally.passed} passed, ${tally.failed} failed, ${tally.skipped} skipped (${minutes} min)`);
  return tally.failed === 0 && tally.passed > 0 ? 0 : 1;
}

/** The backend's hostile-input tests with many more generated cases, on a database of their own. */
async function runFuzzTests(tally: Tally): Promise<void> {
  console.log(`\n[test:long] Hostile-input fuzz tests (FUZZ_RUNS=${FUZZ_RUNS})…`);
  if (!existsSync(join(ROOT, FUZZ_DIR))) {
    // Kept as a code path: the folder arrives with the hostile-input tests.
    console.log(`[test:long] ${FUZZ_DIR} does not exist yet; no fuzz tests to run.`);
    tally.skipped += 1;
    return;
  }
  const db = await startThrowawayDatabase('test-long');
  const reportFile = join(REPORT_DIR, 'vitest-fuzz.json');
  try {
    const result = spawnSync(
      BIN('vitest'),
      ['run', '--project', 'backend', FUZZ_DIR, '--reporter=default', '--reporter=json', `--outputFile.json=${reportFile}`],
      { cwd: ROOT, stdio: 'inherit', env: { ...process.env, AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true', ...db.env, FUZZ_RUNS } },
    );
    if (!existsSync(reportFile)) {
      tally.failed += 1;
      return;
    }
    const report = JSON.parse(readFileSync(reportFile, 'utf8')) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
    tally.passed += report.numPassedTests;
    tally.failed += report.numFailedTests + (result.status !== 0 && report.numFailedTests === 0 ? 1 : 0);
    tally.skipped += report.numPendingTests + report.numTodoTests;
  } finally {
    await db.stop();
  }
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
