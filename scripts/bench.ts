/**
 * `npm run bench`: the product's speed figures on this machine, each beside its target, in one
 * table. Starts its own database and app; not part of `npm test`. Exits non-zero when a budget is
 * missed or a measure fails. `-- --only=reads,writes` runs some groups (core, bundle, paint,
 * reads, writes); `-- --build` forces a fresh frontend build.
 */
import { measureBundleSizes } from './bench/bundle-sizes';
import { startBenchStack, type BenchStack } from './bench/bench-stack';
import { measureCore } from './bench/core-figures';
import { figuresTable, machineLine, type Figure } from './bench/figures-table';
import { measureFirstPaint } from './bench/first-paint';
import { measureReadsAtSize } from './bench/reads-at-size';
import { ensureBenchBuild } from './bench/vite-build';
import { mountBaseline, measureWritesAb } from './bench/writes-ab';

const GROUPS = ['core', 'bundle', 'paint', 'reads', 'writes'] as const;
type Group = (typeof GROUPS)[number];

function parseGroups(args: readonly string[]): Set<Group> {
  const only = args.find((a) => a.startsWith('--only='))?.slice('--only='.length);
  if (!only) return new Set(GROUPS);
  const asked = only.split(',').map((g) => g.trim());
  const unknown = asked.filter((g) => !(GROUPS as readonly string[]).includes(g));
  if (unknown.length > 0) throw new Error(`Unknown bench group ${unknown.join(', ')}; choose from ${GROUPS.join(', ')}.`);
  return new Set(asked as Group[]);
}

/** Runs one group; a crash becomes a failed figure so the table still prints. */
async function step(figures: Figure[], group: Group, measure: () => Promise<Figure[]>) {
  console.log(`[bench] ${group}…`);
  try {
    figures.push(...(await measure()));
  } catch (error) {
    console.error(`[bench] ${group} failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    figures.push({ group, name: `${group} could not be measured (see above)`, value: Number.NaN, unit: '', target: 'runs', ok: false });
  }
}

async function main(): Promise<number> {
  const args = process.argv.slice(2);
  const groups = parseGroups(args);
  console.log(machineLine());
  const figures: Figure[] = [];
  if (groups.has('core')) await step(figures, 'core', measureCore);
  // The build runs before the database starts, so the two do not share the 2 cores.
  const dist = groups.has('bundle') || groups.has('paint') ? await ensureBenchBuild(args.includes('--build')) : undefined;
  if (groups.has('bundle') && dist) await step(figures, 'bundle', () => measureBundleSizes(dist));
  const needsStack = groups.has('paint') || groups.has('reads') || groups.has('writes');
  let stack: BenchStack | undefined;
  // Ctrl-C must not leave a database server behind.
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => {
      console.error(`\n[bench] ${signal}: stopping what the bench started…`);
      void (stack?.stop() ?? Promise.resolve()).finally(() => process.exit(130));
    });
  }
  try {
    if (needsStack) stack = await startBenchStack({ staticDir: dist?.dir, benchRoutes: mountBaseline });
    const running = stack;
    // Paint first: it needs only the demo run, and must not share the CPU with seeding or load.
    if (running && groups.has('paint') && dist) await step(figures, 'paint', () => measureFirstPaint(running));
    if (running && groups.has('reads')) await step(figures, 'reads', () => measureReadsAtSize(running));
    if (running && groups.has('writes')) await step(figures, 'writes', () => measureWritesAb(running));
  } finally {
    await stack?.stop();
  }
  console.log(`\n${machineLine()}\n\n${figuresTable(figures)}`);
  const missed = figures.filter((f) => !f.ok);
  console.log(missed.length === 0 ? '\nEvery budget met.' : `\n${missed.length} budget(s) missed.`);
  return missed.length === 0 ? 0 : 1;
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(`[bench] ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    process.exit(1);
  },
);
