/**
 * `npm test`: a throwaway MariaDB, then unit + API tests (Vitest), then database-kill rounds
 * (scripts/faults), then browser tests (Playwright in Debian's Chromium) against the built app
 * with its own fakes. Everything is stopped after; the exit code is non-zero when anything failed.
 * `--only=unit|faults|e2e` runs one phase.
 */
import { spawn, spawnSync, type SpawnOptions } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';

import { runFaultPhase } from './faults/fault-phase';
import { buildFrontend, spawnServer, startFakes, stopChild, waitForHealth } from './lib/app-stack';
import { ensureDebianPackage } from './lib/debian-packages';
import { freePort } from './lib/free-port';
import { BIN, DATA_DIR, FRONTEND_DIST, ROOT } from './lib/paths';
import { migrateAndSeed } from './lib/prepare-database';
import { startThrowawayDatabase } from './lib/test-database';

// Node 20 is this project's fixed runtime; the SDK's notice about it is noise in test output.
const QUIET_SDK = { AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true' };
const REPORT_DIR = join(ROOT, '.tmp', 'test-reports');
const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
/** Database-kill rounds in `npm test`; `npm run test:long` runs 20. */
const FAULT_ROUNDS = 3;

const STATIC_CHECKS: Array<[string, string, string[]]> = [
  ...['.', 'shared', 'backend', 'frontend', 'e2e'].map((p): [string, string, string[]] => [`typecheck ${p}`, 'tsc', ['-p', p, '--noEmit']]),
  ['lint', 'eslint', ['.', '--max-warnings', '0']],
];

interface Tally {
  passed: number;
  failed: number;
  skipped: number;
}

async function main(): Promise<number> {
  const args = process.argv.slice(2);
  const only = args.find((a) => a.startsWith('--only='))?.split('=')[1];
  // Anything after `--` goes to Playwright as is (e.g. `npm test -- --only=e2e -- --grep offline`).
  const dashDash = args.indexOf('--');
  const playwrightArgs = dashDash >= 0 ? args.slice(dashDash + 1) : [];
  rmSync(REPORT_DIR, { recursive: true, force: true });
  mkdirSync(REPORT_DIR, { recursive: true });
  const db = await startThrowawayDatabase('test');
  const tally: Tally = { passed: 0, failed: 0, skipped: 0 };
  let exitCode = 0;
  try {
    if (!only) {
      console.log('\n[test] Typecheck and lint…');
      for (const [label, bin, args] of STATIC_CHECKS) {
        const result = spawnSync(BIN(bin), args, { cwd: ROOT, stdio: 'inherit' });
        if (result.status !== 0) {
          console.error(`[test] ${label} failed.`);
          tally.failed += 1;
          exitCode = 1;
        }
      }
    }
    if (!only || only === 'unit') {
      console.log('\n[test] Unit and API tests (Vitest)…');
      const vitest = spawnSync(
        BIN('vitest'),
        ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${join(REPORT_DIR, 'vitest.json')}`],
        { cwd: ROOT, stdio: 'inherit', env: { ...process.env, ...QUIET_SDK, ...db.env } },
      );
      addVitest(tally, join(REPORT_DIR, 'vitest.json'));
      if (vitest.status !== 0) exitCode = 1;
    }
    if (!only || only === 'faults') {
      // Its own MariaDB and server, since it kills the database: see scripts/faults/db-kill.ts.
      const faults = runFaultPhase(FAULT_ROUNDS, join(REPORT_DIR, 'faults.json'));
      tally.passed += faults.passed;
      tally.failed += faults.failed;
      if (faults.failed > 0) exitCode = 1;
    }
    if (!only || only === 'e2e') {
      // The browser tests get a database of their own, seeded with the demo lab like `npm start`.
      if ((await runBrowserTests(db.addDatabase('tracewright_e2e'), tally, playwrightArgs)) !== 0) exitCode = 1;
    }
  } catch (error) {
    console.error(`[test] ${error instanceof Error ? error.stack : String(error)}`);
    exitCode = 1;
  } finally {
    await db.stop();
  }
  if (tally.passed + tally.failed === 0) exitCode = 1;
  if (tally.failed > 0) exitCode = 1;
  // The plain closing line CI reads, whatever the runners printed above.
  console.log(`\n${tally.passed} passed, ${tally.failed} failed, ${tally.skipped} skipped`);
  return exitCode;
}

async function runBrowserTests(dbEnv: Record<string, string>, tally: Tally, extraArgs: string[]): Promise<number> {
  console.log('\n[test] Browser tests (Playwright, Debian Chromium)…');
  ensureDebianPackage(CHROMIUM, ['chromium']);
  if (!existsSync(join(FRONTEND_DIST, 'index.html')) || process.env.SKIP_BUILD !== '1') buildFrontend();
  const stackDir = join(DATA_DIR, `e2e-stack-${process.pid}`);
  const fakes = await startFakes(stackDir);
  const port = await freePort();
  const baseUrl = `http://localhost:${port}`;
  const env: Record<string, string> = {
    ...dbEnv,
    NODE_ENV: 'test',
    PORT: String(port),
    PUBLIC_URL: baseUrl,
    JWT_SECRET: 'e2e-'.padEnd(48, 'x'),
    SMTP_PORT: String(fakes.smtp.port),
    MAIL_CAPTURE_DIR: fakes.mailDir,
    S3_ENDPOINT: fakes.s3.endpoint,
    STATIC_DIR: FRONTEND_DIST,
    LOG_LEVEL: 'warn',
    SIGN_IN_LIMIT: '200',
  };
  await migrateAndSeed(env);
  const server = spawnServer(env, { quiet: true });
  try {
    await waitForHealth(`http://127.0.0.1:${port}`, server);
    // Async on purpose: the SMTP and S3 fakes live in this process and must keep answering.
    const status = await run(BIN('playwright'), ['test', '--config', join(ROOT, 'e2e', 'playwright.config.ts'), ...extraArgs], {
      cwd: join(ROOT, 'e2e'),
      stdio: 'inherit',
      env: {
        ...process.env,
        E2E_BASE_URL: baseUrl,
        E2E_MAIL_DIR: fakes.mailDir,
        CHROMIUM_PATH: CHROMIUM,
        E2E_JSON_REPORT: join(REPORT_DIR, 'playwright.json'),
      },
    });
    addPlaywright(tally, join(REPORT_DIR, 'playwright.json'));
    return status;
  } finally {
    await stopChild(server);
    await fakes.close();
    rmSync(stackDir, { recursive: true, force: true });
  }
}

function run(command: string, args: string[], options: SpawnOptions): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(command, args, { stdio: 'inherit', ...options });
    child.once('exit', (code) => resolve(code ?? 1));
    child.once('error', () => resolve(1));
  });
}

function addVitest(tally: Tally, file: string) {
  if (!existsSync(file)) return;
  const report = JSON.parse(readFileSync(file, 'utf8')) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
  tally.passed += report.numPassedTests;
  tally.failed += report.numFailedTests;
  tally.skipped += report.numPendingTests + report.numTodoTests;
}

function addPlaywright(tally: Tally, file: string) {
  if (!existsSync(file)) {
    tally.failed += 1;
    return;
  }
  const report = JSON.parse(readFileSync(file, 'utf8')) as { stats: { expected: number; unexpected: number; flaky: number; skipped: number } };
  tally.passed += report.stats.expected + report.stats.flaky;
  tally.failed += report.stats.unexpected;
  tally.skipped += report.stats.skipped;
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
