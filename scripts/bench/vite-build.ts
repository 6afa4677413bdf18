import { existsSync, mkdirSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';

import { build, type Plugin } from 'vite';

import { ROOT } from '../lib/paths';

/**
 * The bench's own build: kept apart from frontend/dist, which tests and `npm start` may be
 * serving, and outside any dot-folder (.tmp, .data), from which Express will not send files.
 */
export const BENCH_DIST = join(tmpdir(), 'tracewright-bench-dist');
const MANIFEST = join(BENCH_DIST, '.vite', 'manifest.json');
const MODULES = join(BENCH_DIST, '.vite', 'bench-modules.json');

export interface BenchBuild {
  dir: string;
  manifestFile: string;
  /** Output file → the source modules bundled into it (ids relative to the repository). */
  modulesFile: string;
}

/** Records which source modules went into each output chunk: the manifest names chunks, not their contents. */
const chunkModules = (): Plugin => {
  const byFile: Record<string, string[]> = {};
  return {
    name: 'tracewright-bench-chunk-modules',
    apply: 'build',
    generateBundle(_options, bundle) {
      for (const output of Object.values(bundle)) {
        if (output.type === 'chunk') byFile[output.fileName] = output.moduleIds.map((id) => relative(ROOT, id.replace(/^\0/, '')));
      }
    },
    writeBundle() {
      mkdirSync(join(BENCH_DIST, '.vite'), { recursive: true });
      writeFileSync(MODULES, JSON.stringify(byFile));
    },
  };
};

const newestChange = (dir: string): number =>
  readdirSync(dir, { withFileTypes: true }).reduce((newest, entry) => {
    const path = join(dir, entry.name);
    return Math.max(newest, entry.isDirectory() ? newestChange(path) : statSync(path).mtimeMs);
  }, 0);

/** Builds the frontend with a manifest unless a build newer than every source file is there already (or `force`). */
export async function ensureBenchBuild(force: boolean): Promise<BenchBuild> {
  const sources = Math.max(newestChange(join(ROOT, 'frontend', 'src')), newestChange(join(ROOT, 'shared', 'src')), statSync(join(ROOT, 'frontend', 'vite.config.ts')).mtimeMs);
  const isFresh = existsSync(MANIFEST) && existsSync(MODULES) && statSync(MODULES).mtimeMs > sources;
  if (force || !isFresh) {
    console.log('[bench] building the frontend (vite build --manifest)…');
    await build({
      root: join(ROOT, 'frontend'),
      configFile: join(ROOT, 'frontend', 'vite.config.ts'),
      logLevel: 'warn',
      plugins: [chunkModules()],
      build: { manifest: true, outDir: BENCH_DIST, emptyOutDir: true },
    });
  }
  return { dir: BENCH_DIST, manifestFile: MANIFEST, modulesFile: MODULES };
}
