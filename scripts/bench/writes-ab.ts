import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, tmpdir } from 'node:os';
import { join } from 'node:path';

import express, { type Express } from 'express';
import { QueryTypes } from 'sequelize';

import type { AppContext } from '../../backend/src/app-context';
import { RecipeVersionModel } from '../../backend/src/models/recipe-version.model';
import { RecipeModel } from '../../backend/src/models/recipe.model';
import { DEMO_PASSWORD } from '../../backend/src/seed/demo-people';
import { versionContent } from '../../backend/src/services/recipe-dto';
import { BIN, ROOT } from '../lib/paths';
import { insertRows } from './bulk-insert';
import { signIn, type BenchStack } from './bench-stack';
import { info, type Figure } from './figures-table';
import type { LoadJob, LoadResult } from './load-driver';
import { percentile } from './percentiles';
import { measureCpu } from './process-cpu';

const CONNECTIONS = 50;
const SECONDS = 20;
/** Enough planned runs that no step is completed twice even at ~1,000 completions a second. */
const WRITE_RUNS = 8_000;
const BASELINE_TABLE = 'bench_baseline';
/** Rounds of the real route: the warm-up and the two measured ones. */
const REAL_ROUNDS = 3;

/**
 * The floor under every write: one parameterised INSERT through the app's own pool, no auth, no
 * validation, no audit. Mounted by the bench in front of the product app; backend/ knows nothing of it.
 */
export function mountBaseline(outer: Express, ctx: AppContext): void {
  outer.post('/bench/baseline', express.json(), async (req, res) => {
    const note = typeof req.body?.note === 'string' ? req.body.note : '';
    await ctx.sequelize.query(`INSERT INTO ${BASELINE_TABLE} (note, created_at) VALUES (?, ?)`, { replacements: [note, new Date()] });
    res.status(201).json({ ok: true });
  });
}

/** Planned runs of TOUCH-4K whose every step is in progress, so each request can complete one. */
async function prepareWriteRuns(ctx: AppContext, operatorId: number): Promise<Array<[number, string]>> {
  const recipe = await RecipeModel.findOne({ where: { code: 'TOUCH-4K' } });
  const version = recipe && (await RecipeVersionModel.findOne({ where: { recipeId: recipe.id, number: 1 } }));
  if (!recipe || !version) throw new Error('The demo recipe TOUCH-4K v1 is missing.');
  const stepIds = versionContent(version).steps.map((s) => s.id);
  const now = new Date();
  const runs = Array.from({ length: WRITE_RUNS }, (_, i) => [`W-${now.getUTCFullYear()}-${String(i + 1).padStart(5, '0')}`, recipe.id, version.id, 'in-progress', 8, '', 1, operatorId, now, now]);
  await insertRows(ctx.sequelize, 'runs', ['code', 'recipe_id', 'version_id', 'state', 'quantity', 'notes', 'version', 'created_by', 'created_at', 'updated_at'], runs);
  const ids = (await ctx.sequelize.query<{ id: number }>("SELECT id FROM runs WHERE code LIKE 'W-%' ORDER BY id", { type: QueryTypes.SELECT })).map((r) => Number(r.id));
  const records = ids.flatMap((runId) => stepIds.map((stepId) => [runId, stepId, 'in-progress', operatorId, now, operatorId, now, '', now, now]));
  const columns = ['run_id', 'step_id', 'state', 'safety_acknowledged_by', 'safety_acknowledged_at', 'started_by', 'started_at', 'note', 'created_at', 'updated_at'];
  await insertRows(ctx.sequelize, 'run_step_records', columns, records);
  // Step-major order: consecutive requests (the 50 in flight) hit 50 different runs, as 50 tablets would.
  return stepIds.flatMap((stepId) => ids.map((runId): [number, string] => [runId, stepId]));
}

function runDriver(job: LoadJob, workDir: string): Promise<LoadResult> {
  const file = join(workDir, `job-${Date.now()}.json`);
  writeFileSync(file, JSON.stringify(job));
  return new Promise((resolve, reject) => {
    const child = spawn(BIN('tsx'), [join(ROOT, 'scripts', 'bench', 'load-driver.ts'), file], { cwd: ROOT, stdio: ['ignore', 'pipe', 'inherit'] });
    let out = '';
    child.stdout.on('data', (chunk: Buffer) => (out += chunk.toString('utf8')));
    child.once('error', reject);
    child.once('exit', (code) => {
      const last = out.trim().split('\n').at(-1) ?? '';
      if (code !== 0 || !last.startsWith('{')) reject(new Error(`The load driver stopped (exit ${code}): ${out.slice(-500)}`));
      else resolve(JSON.parse(last) as LoadResult);
    });
  });
}

interface Totals {
  perSecond: number[];
  latencies: number[];
  failed: number;
  problem: string | null;
  /** CPU of the app server's process and of mariadbd over the recorded rounds, in µs (null: not readable). */
  appMicros: number;
  databaseMicros: number | null;
}

const emptyTotals = (): Totals => ({ perSecond: [], latencies: [], failed: 0, problem: null, appMicros: 0, databaseMicros: 0 });

/**
 * Baseline (A) and the real step-completion route (B), alternated A B A B so drift on a busy
 * machine (other processes, a warming buffer pool) falls on both alike; 50 connections, 20 s each.
 */
export async function measureWritesAb(stack: BenchStack): Promise<Figure[]> {
  stack.db.instance.rootSql(`CREATE TABLE \`${stack.env.DB_NAME}\`.${BASELINE_TABLE} (id INT AUTO_INCREMENT PRIMARY KEY, note VARCHAR(200) NOT NULL, created_at DATETIME(3) NOT NULL) ENGINE=InnoDB`);
  const operator = await signIn(stack.baseUrl, 'operator@larkspur-lab.example', DEMO_PASSWORD);
  const targets = await prepareWriteRuns(stack.ctx, operator.userId);
  const workDir = mkdtempSync(join(tmpdir(), 'tw-bench-'));
  const totals = { baseline: emptyTotals(), real: emptyTotals() };
  const databasePid = stack.db.instance.process().pid;
  const realHeaders = { cookie: operator.cookie, 'x-csrf-token': operator.csrf };
  let offset = 0;
  let completedOk = 0;
  try {
    const round = async (kind: 'baseline' | 'real', seconds: number, record: boolean) => {
      const job: LoadJob =
        kind === 'baseline'
          ? { url: `${stack.baseUrl}/bench/baseline`, connections: CONNECTIONS, seconds, headers: {} }
          : { url: stack.baseUrl, connections: CONNECTIONS, seconds, headers: realHeaders, targets, offset };
      const { result, appMicros, databaseMicros } = await measureCpu(databasePid, () => runDriver(job, workDir));
      if (kind === 'real') {
        offset += result.used;
        completedOk += result.latenciesMs.length - result.non2xx;
      }
      if (!record) return;
      const t = totals[kind];
      t.perSecond.push(result.requestsPerSecond);
      t.latencies.push(...result.latenciesMs);
      t.failed += result.non2xx + result.errors;
      t.problem ??= result.firstProblem;
      t.appMicros += appMicros;
      t.databaseMicros = t.databaseMicros === null || databaseMicros === null ? null : t.databaseMicros + databaseMicros;
    };
    // A short unrecorded warm-up of each, so neither side pays for the JIT or a cold pool.
    await round('baseline', 3, false);
    await round('real', 3, false);
    for (const kind of ['baseline', 'real', 'baseline', 'real'] as const) await round(kind, SECONDS, true);
  } finally {
    rmSync(workDir, { recursive: true, force: true });
  }
  if (offset > targets.length) totals.real.problem ??= `ran out of prepared steps (${offset} requests for ${targets.length} steps)`;
  const done = await stack.ctx.sequelize.query<{ n: number }>("SELECT COUNT(*) AS n FROM run_step_records r JOIN runs u ON u.id = r.run_id WHERE u.code LIKE 'W-%' AND r.state = 'done'", { type: QueryTypes.SELECT });
  return writeFigures(totals, completedOk, Number(done[0]?.n ?? 0));
}

const perRequest = (micros: number, t: Totals) => micros / Math.max(1, t.latencies.length);

/**
 * Where the time goes: server CPU per answered request, the app's process and mariadbd apart (the
 * load driver is a process of its own and not counted). The ceiling is the completion rate the
 * machine's cores could carry at that CPU if the app and the database kept them all busy, over the
 * baseline's measured rate; the last figure is the CPU a completion may use for the ≥ 0.5 budget
 * to be reachable at all on this machine.
 */
function cpuFigures(totals: { baseline: Totals; real: Totals }): Figure[] {
  const { baseline, real } = totals;
  if (baseline.databaseMicros === null || real.databaseMicros === null) return [];
  const realPerRequest = perRequest(real.appMicros + real.databaseMicros, real);
  const ceiling = (cpus().length * 1_000_000) / realPerRequest / mean(baseline.perSecond);
  return [
    info('writes', 'baseline CPU per request: app server', perRequest(baseline.appMicros, baseline), 'µs'),
    info('writes', 'baseline CPU per request: MariaDB', perRequest(baseline.databaseMicros, baseline), 'µs'),
    info('writes', 'step completion CPU per request: app server', perRequest(real.appMicros, real), 'µs'),
    info('writes', 'step completion CPU per request: MariaDB', perRequest(real.databaseMicros, real), 'µs'),
    info('writes', `ratio ceiling from server CPU (${cpus().length} cores all busy)`, ceiling, '×'),
    info('writes', 'server CPU per completion that 0.5 allows', (cpus().length * 1_000_000) / (0.5 * mean(baseline.perSecond)), 'µs'),
  ];
}

const mean = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0) / Math.max(1, xs.length);

function writeFigures(totals: { baseline: Totals; real: Totals }, completedOk: number, doneInDb: number): Figure[] {
  for (const [kind, t] of Object.entries(totals)) if (t.problem) console.error(`[bench] ${kind} writes: first failed answer: ${t.problem}`);
  const base = mean(totals.baseline.perSecond);
  const real = mean(totals.real.perSecond);
  const ratio = real / base;
  const p95 = percentile(totals.real.latencies, 95);
  const inFlight = CONNECTIONS * REAL_ROUNDS;
  const label = `${CONNECTIONS} conn, 2×${SECONDS} s`;
  return [
    info('writes', `baseline INSERT req/s (${label})`, base, 'req/s'),
    info('writes', 'baseline INSERT p50', percentile(totals.baseline.latencies, 50), 'ms'),
    info('writes', 'baseline INSERT p95', percentile(totals.baseline.latencies, 95), 'ms'),
    info('writes', `step completion req/s (${label})`, real, 'req/s'),
    { group: 'writes', name: 'step completion / baseline req/s', value: ratio, unit: '×', target: '≥ 0.5', ok: ratio >= 0.5 },
    info('writes', 'step completion p50', percentile(totals.real.latencies, 50), 'ms'),
    { group: 'writes', name: 'step completion p95', value: p95, unit: 'ms', target: '≤ 50 ms', ok: p95 <= 50 },
    info('writes', 'step completion p99', percentile(totals.real.latencies, 99), 'ms'),
    ...cpuFigures(totals),
    { group: 'writes', name: 'non-2xx or failed answers (both routes)', value: totals.baseline.failed + totals.real.failed, unit: '', target: '0', ok: totals.baseline.failed + totals.real.failed === 0 },
    // Every 2xx completion must be in the database: the figure that shows the route did the work. A round
    // ends with up to one request per connection still in flight, which the server completes unseen.
    { group: 'writes', name: 'steps recorded done (incl. warm-up)', value: doneInDb, unit: '', target: `${completedOk}–${completedOk + inFlight}`, ok: doneInDb > 0 && doneInDb >= completedOk && doneInDb <= completedOk + inFlight },
  ];
}
