import { readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { gzipSync } from 'node:zlib';

import { info, type Figure } from './figures-table';
import type { BenchBuild } from './vite-build';

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  isDynamicEntry?: boolean;
  name?: string;
  imports?: string[];
}
type Manifest = Record<string, ManifestChunk>;

/**
 * What the tablet's run view must never download: the builder (its page and drag and drop), the
 * charts and the PDF renderer. Desk routes' loaders live in the shell and are allowed.
 */
const NOT_IN_RUN_VIEW = [/node_modules\/@dnd-kit\//, /node_modules\/recharts\//, /node_modules\/d3-/, /node_modules\/pdfjs-dist\//, /features\/recipes\/routes\/recipe-builder-page/, /features\/quality\/components\/trend-chart/];
const RUN_VIEW_BUDGET_KB = 120;
/**
 * The framework chunk (React, React DOM, React Router, TanStack Query: the product's fixed stack,
 * grouped as 'core' in vite.config.ts) is over 100 KB gzip by itself. The budget measures what
 * Tracewright adds on top of it; the full cold load is printed beside it.
 */
const FRAMEWORK_CHUNK = 'core';
const ROUTE_PAGE = /^src\/features\/([^/]+)\/routes\/(.+)\.tsx?$/;

/** Every chunk a set of entries loads before it can run: the entries and their static imports, transitively. */
function staticClosure(manifest: Manifest, keys: readonly string[]): Set<string> {
  const seen = new Set<string>();
  const stack = [...keys];
  while (stack.length > 0) {
    const key = stack.pop() as string;
    if (seen.has(key) || !manifest[key]) continue;
    seen.add(key);
    stack.push(...(manifest[key].imports ?? []));
  }
  return seen;
}

/** Lazy route chunks grouped per route: the run view's loader and page load together. */
function routeGroups(manifest: Manifest): Map<string, string[]> {
  const groups = new Map<string, string[]>();
  for (const [key, chunk] of Object.entries(manifest)) {
    const match = chunk.isDynamicEntry && chunk.src ? ROUTE_PAGE.exec(chunk.src) : null;
    if (!match) continue;
    const route = `${match[1]}/${(match[2] as string).replace(/-(page|loader)$/, '')}`;
    groups.set(route, [...(groups.get(route) ?? []), key]);
  }
  return groups;
}

/**
 * Gzip size of the JavaScript each lazy route needs on a cold load (the app entry, the route's
 * chunks and every static import of both), from the Vite manifest; gzip level 6, the zlib default
 * most servers and proxies use (common practice, no source). Checks module by module that the run
 * view's closure holds no builder or chart code.
 */
export async function measureBundleSizes(dist: BenchBuild): Promise<Figure[]> {
  const manifest = JSON.parse(readFileSync(dist.manifestFile, 'utf8')) as Manifest;
  const modules = JSON.parse(readFileSync(dist.modulesFile, 'utf8')) as Record<string, string[]>;
  const sizes = new Map<string, number>();
  const gzipKb = (key: string) => {
    const file = (manifest[key] as ManifestChunk).file;
    if (!sizes.has(file)) sizes.set(file, gzipSync(readFileSync(join(dist.dir, file)), { level: 6 }).length / 1024);
    return sizes.get(file) as number;
  };
  const sum = (keys: Iterable<string>) => [...keys].filter((k) => /\.m?js$/.test((manifest[k] as ManifestChunk).file)).reduce((total, k) => total + gzipKb(k), 0);
  const entry = Object.keys(manifest).find((k) => manifest[k]?.isEntry);
  if (!entry) throw new Error('The Vite manifest names no entry.');
  const shell = staticClosure(manifest, [entry]);
  const figures: Figure[] = [info('bundle', 'app shell: entry + static imports (gzip)', sum(shell), 'KB')];
  for (const [route, keys] of [...routeGroups(manifest)].sort(([a], [b]) => a.localeCompare(b))) {
    const closure = staticClosure(manifest, [entry, ...keys]);
    const total = sum(closure);
    const own = sum([...closure].filter((k) => !shell.has(k)));
    const label = `route ${route}: cold load (gzip; ${own.toFixed(1)} KB its own)`;
    if (route !== 'run-view/run') {
      figures.push(info('bundle', label, total, 'KB'));
      continue;
    }
    const framework = sum([...closure].filter((k) => manifest[k]?.name === FRAMEWORK_CHUNK));
    if (framework === 0) throw new Error(`No '${FRAMEWORK_CHUNK}' chunk in the run view's closure: check the code-splitting groups in vite.config.ts.`);
    figures.push(info('bundle', label, total, 'KB'));
    const ours = total - framework;
    figures.push({ group: 'bundle', name: `route run-view/run: beyond the framework chunk (${framework.toFixed(0)} KB)`, value: ours, unit: 'KB', target: `≤ ${RUN_VIEW_BUDGET_KB} KB`, ok: ours <= RUN_VIEW_BUDGET_KB });
    figures.push(runViewPurity(manifest, modules, closure));
  }
  if (!figures.some((f) => f.name.startsWith('route run-view/run'))) throw new Error('No run view route chunk (features/run-view/routes/run-page) in the manifest.');
  return figures;
}

function runViewPurity(manifest: Manifest, modules: Record<string, string[]>, closure: Set<string>): Figure {
  const ids = [...closure].flatMap((k) => modules[(manifest[k] as ManifestChunk).file] ?? []);
  // The check means something only if the module map covers the run view itself.
  const seesRunPage = ids.some((id) => id.endsWith(join('features', 'run-view', 'routes', 'run-page.tsx')));
  const offending = ids.filter((id) => NOT_IN_RUN_VIEW.some((re) => re.test(id)));
  if (offending.length > 0) console.error(`[bench] builder/chart modules in the run view: ${[...new Set(offending.map((id) => basename(id)))].slice(0, 10).join(', ')}`);
  const value = seesRunPage ? offending.length : Number.NaN;
  return { group: 'bundle', name: `builder/chart modules in run view (of ${ids.length} modules)`, value, unit: '', target: '0', ok: seesRunPage && offending.length === 0 };
}
