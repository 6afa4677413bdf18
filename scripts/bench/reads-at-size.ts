import { performance } from 'node:perf_hooks';

import { DEMO_PASSWORD } from '../../backend/src/seed/demo-people';
import { signIn, type BenchStack, type SignedIn } from './bench-stack';
import { info, type Figure } from './figures-table';
import { percentile } from './percentiles';
import { seedAtSize, SIZES } from './seed-at-size';

const WARM_UP = 20;
const REQUESTS = 200;
/** A measure slower than its budget many times over stops early, so the bench still ends; its label says so. */
const TIME_CAP_MS = 90_000;
// Targets from the issue, for this 2-core machine.
const QUEUE_P95_MS = 100;
const TREND_P95_MS = 150;

const isoDay = (msAgo: number) => new Date(Date.now() - msAgo).toISOString().slice(0, 10);

/**
 * Times `REQUESTS` sequential GETs after a warm-up of `WARM_UP` (at most 10 s); any non-200 or an
 * empty answer fails the figure. Past TIME_CAP_MS it stops once it has 20 samples.
 */
async function timeGet(base: string, who: SignedIn, path: string, hasData: (body: unknown) => boolean): Promise<{ samples: number[]; problem: string | null }> {
  const samples: number[] = [];
  const warmUntil = performance.now() + 10_000;
  const deadline = performance.now() + TIME_CAP_MS;
  console.log(`[bench]   GET ${path}`);
  let warmed = 0;
  while (samples.length < REQUESTS && (samples.length < 20 || performance.now() < deadline)) {
    const started = performance.now();
    const res = await fetch(`${base}${path}`, { headers: { cookie: who.cookie } });
    const body: unknown = await res.json();
    const elapsed = performance.now() - started;
    if (res.status !== 200) return { samples, problem: `${path} answered ${res.status}: ${JSON.stringify(body).slice(0, 300)}` };
    if (!hasData(body)) return { samples, problem: `${path} answered with no data` };
    if (warmed < WARM_UP && started < warmUntil) warmed += 1;
    else samples.push(elapsed);
  }
  return { samples, problem: null };
}

/** Seeds the lab to size, then times the queue's first page under three filter sets and one trend, signed in as quality. */
export async function measureReadsAtSize(stack: BenchStack): Promise<Figure[]> {
  const seedStarted = performance.now();
  const lab = await seedAtSize(stack.ctx);
  // Fresh index statistics, as a lab's long-running server would have; the app account may not run ANALYZE.
  stack.db.instance.rootSql(`ANALYZE TABLE ${['deviations', 'run_readings', 'runs', 'run_pieces'].map((t) => `\`${stack.env.DB_NAME}\`.${t}`).join(', ')}`);
  const figures: Figure[] = [info('reads', `seed ${SIZES.deviations.toLocaleString('en')} deviations + ${SIZES.readings.toLocaleString('en')} readings (multi-row INSERT)`, (performance.now() - seedStarted) / 1000, 's')];
  const quality = await signIn(stack.baseUrl, 'quality@larkspur-lab.example', DEMO_PASSWORD);
  const hasItems = (body: unknown) => ((body as { items?: unknown[] }).items?.length ?? 0) > 0;
  const queues: Array<[string, string]> = [
    ['queue p1: open + in review, newest', 'state=open,in-review'],
    ['queue p1: critical, print pass, 90 days', `severity=critical&stepKind=print-pass&from=${isoDay(90 * 86_400_000)}&to=${isoDay(0)}`],
    ['queue p1: text "Ag" (2-letter word)', 'q=Ag'],
  ];
  for (const [label, query] of queues) {
    const { samples, problem } = await timeGet(stack.baseUrl, quality, `/api/deviations?${query}`, hasItems);
    figures.push(...latencyFigures(`${label}`, samples, QUEUE_P95_MS, problem));
  }
  const trendPath = `/api/trends?recipeId=${lab.recipeId}&specId=${encodeURIComponent(lab.trendSpecId)}`;
  // The demo run's own readings of the spec come on top of the seeded ones.
  const hasPoints = (body: unknown) => ((body as { points?: unknown[] }).points?.length ?? 0) >= lab.trendPoints;
  const trend = await timeGet(stack.baseUrl, quality, trendPath, hasPoints);
  figures.push(...latencyFigures(`trend, one spec, ${lab.trendPoints.toLocaleString('en')} points`, trend.samples, TREND_P95_MS, trend.problem));
  return figures;
}

function latencyFigures(label: string, samples: number[], p95Budget: number, problem: string | null): Figure[] {
  if (problem) console.error(`[bench] ${label}: ${problem}`);
  const p95 = percentile(samples, 95);
  return [
    info('reads', `${label} p50 (${samples.length} req${samples.length < REQUESTS ? ', time-capped' : ''})`, percentile(samples, 50), 'ms'),
    { group: 'reads', name: `${label} p95`, value: problem ? Number.NaN : p95, unit: 'ms', target: `≤ ${p95Budget} ms`, ok: !problem && p95 <= p95Budget },
  ];
}
