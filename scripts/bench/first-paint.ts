import { chromium, type Browser, type Page } from 'playwright-core';

import { RunModel } from '../../backend/src/models/run.model';
import { DEMO_PASSWORD } from '../../backend/src/seed/demo-people';
import type { BenchStack } from './bench-stack';
import { info, type Figure } from './figures-table';
import { median } from './percentiles';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
// The same flags as e2e/playwright.config.ts: Debian's Chromium, headless, nothing downloaded.
const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const LOADS = 5;
const LCP_BUDGET_MS = 1_500;
/** web.dev's "good" Largest Contentful Paint (Core Web Vitals): 2.5 s at the 75th percentile. */
const GOOD_LCP_MS = 2_500;
/** A mid-range tablet is about 4× slower than a desktop core (common practice, no source). */
const CPU_SLOWDOWN = 4;
/**
 * A "Fast 3G"-like link: 150 ms round trip, 1.6 Mbit/s down, 750 kbit/s up — the figures of
 * Chrome DevTools' Fast 3G preset and Lighthouse's mobile throttling (common practice, no source
 * beyond those tools). CDP takes bytes per second.
 */
const NETWORK = { offline: false, latency: 150, downloadThroughput: (1.6 * 1024 * 1024) / 8, uploadThroughput: (750 * 1024) / 8 };
/** A 10-inch tablet held sideways, as at the bench. */
const VIEWPORT = { width: 1280, height: 800 };

/** Throttles a page like the tablet, opens the run view and returns its Largest Contentful Paint in ms. */
async function paintOnce(page: Page, runId: number, runCode: string): Promise<number> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: CPU_SLOWDOWN });
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', NETWORK);
  await page.goto(`/run/${runId}`, { waitUntil: 'load', timeout: 60_000 });
  // Quiet first, then one look: polling the page for text while it loads runs Playwright's
  // selector engine on the same throttled main thread and delayed the very paint being measured.
  await page.waitForLoadState('networkidle', { timeout: 60_000 });
  // The run header names the run: proof the page shows the run, not a sign-in form or an error.
  await page.getByText(`Run ${runCode}`).first().waitFor({ timeout: 60_000 });
  return await page.evaluate(
    () =>
      new Promise<number>((resolve) => {
        // buffered: the entries painted before this observer existed; the last one is the final LCP.
        new PerformanceObserver((list) => resolve(list.getEntries().at(-1)?.startTime ?? Number.NaN)).observe({ type: 'largest-contentful-paint', buffered: true });
        setTimeout(() => resolve(Number.NaN), 5_000);
      }),
  );
}

/**
 * A first visit (fresh context, empty cache) and then a return visit in the same context, once
 * the service worker has installed: the everyday case of a lab tablet that keeps the app.
 */
async function loadTwice(browser: Browser, baseUrl: string, runId: number, runCode: string): Promise<{ cold: number; installed: number }> {
  const context = await browser.newContext({ viewport: VIEWPORT, hasTouch: true, baseURL: baseUrl });
  try {
    // Signed in beforehand (cookies in the context), so the load measures the run view, not the sign-in form.
    const signIn = await context.request.post('/api/auth/sign-in', { data: { email: 'operator@larkspur-lab.example', password: DEMO_PASSWORD } });
    if (!signIn.ok()) throw new Error(`Signing in the browser failed: ${signIn.status()}`);
    const first = await context.newPage();
    const cold = await paintOnce(first, runId, runCode);
    await first.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await first.close();
    const installed = await paintOnce(await context.newPage(), runId, runCode);
    return { cold, installed };
  } finally {
    await context.close();
  }
}

/**
 * Largest Contentful Paint of the tablet run view on the demo run, slow CPU and network: the
 * median of first visits against the common "good" threshold (2.5 s), and of return visits on a
 * tablet with the app installed against our own 1.5 s.
 */
export async function measureFirstPaint(stack: BenchStack): Promise<Figure[]> {
  const run = await RunModel.findOne({ order: [['id', 'ASC']] });
  if (!run) throw new Error('The demo lab has no run to open.');
  const browser = await chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS });
  const samples: Array<{ cold: number; installed: number }> = [];
  try {
    for (let i = 0; i < LOADS; i += 1) samples.push(await loadTwice(browser, stack.baseUrl, run.id, run.code));
  } finally {
    await browser.close();
  }
  const figure = (visit: 'cold' | 'installed', label: string, budget: number): Figure[] => {
    const values = samples.map((s) => s[visit]);
    const lcp = median(values);
    const name = `run view LCP, ${CPU_SLOWDOWN}× CPU, Fast-3G-like, ${label}`;
    return [
      { group: 'paint', name: `${name} (median of ${LOADS})`, value: lcp, unit: 'ms', target: `≤ ${budget} ms`, ok: values.every(Number.isFinite) && lcp <= budget },
      info('paint', `${name} (slowest of ${LOADS})`, Math.max(...values), 'ms'),
    ];
  };
  return [...figure('cold', 'first visit', GOOD_LCP_MS), ...figure('installed', 'app installed', LCP_BUDGET_MS)];
}
