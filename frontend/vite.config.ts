import { fileURLToPath } from 'node:url';

import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import type { Plugin } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

// Pinned so `vite build` writes to frontend/dist whichever folder it is started from.
const root = fileURLToPath(new URL('.', import.meta.url));

// The backend sets cookies on its own origin; proxying /api keeps the app same-origin in
// development, which the double-submit CSRF cookie and `credentials: 'same-origin'` rely on.
const apiProxy = { '/api': { target: 'http://127.0.0.1:8080' } };

// Our home-screen icon: a copper trace with two pads on paper, drawn for Tracewright.
const PWA_ICON_SVG = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 512 512"><rect width="512" height="512" rx="96" fill="#fbf8f3"/><path d="M120 360V232a56 56 0 0 1 56-56h160a56 56 0 0 0 56-56" fill="none" stroke="#a2561f" stroke-width="44" stroke-linecap="round"/><circle cx="120" cy="380" r="44" fill="#1d2023"/><circle cx="392" cy="112" r="44" fill="#1d2023"/></svg>`;

/** Writes the icon into the build, so the web manifest can point at it. */
const pwaIcon = (): Plugin => ({
  name: 'tracewright-pwa-icon',
  apply: 'build',
  generateBundle() {
    this.emitFile({ type: 'asset', fileName: 'pwa-icon.svg', source: PWA_ICON_SVG });
  },
});

/**
 * Answers the service worker serves from its cache are marked, so the run view does not measure
 * the tablet's clock offset from an old `serverTime`. Workbox copies this function's source into
 * the worker: it must not use anything from this file.
 */
const markCachedAnswers = {
  cachedResponseWillBeUsed: async ({ cachedResponse }: { cachedResponse?: Response }) => {
    if (!cachedResponse) return cachedResponse;
    const headers = new Headers(cachedResponse.headers);
    headers.set('X-Tracewright-Cache', 'hit');
    return new Response(await cachedResponse.blob(), { status: cachedResponse.status, statusText: cachedResponse.statusText, headers });
  },
};

// The app shell is precached; the run a tablet works on, the session and stored files are cached
// as they are fetched, so a reload with no network still shows the run (see features/run-view).
const pwa = VitePWA({
  registerType: 'autoUpdate',
  injectRegister: false,
  includeAssets: [],
  manifest: {
    name: 'Tracewright',
    short_name: 'Tracewright',
    description: 'Recipes, runs and quality records for printed soft circuits.',
    start_url: '/run/scan',
    display: 'standalone',
    background_color: '#fbf8f3',
    theme_color: '#1d2023',
    icons: [{ src: '/pwa-icon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' }],
  },
  workbox: {
    globPatterns: ['**/*.{html,js,css,woff2,svg}'],
    // The libraries chunk is large; it is the app shell all the same.
    maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
    navigateFallback: 'index.html',
    navigateFallbackDenylist: [/^\/api\//],
    cleanupOutdatedCaches: true,
    skipWaiting: true,
    clientsClaim: true,
    runtimeCaching: [
      {
        urlPattern: ({ url, sameOrigin }) => sameOrigin && url.pathname.startsWith('/api/runs/'),
        method: 'GET',
        handler: 'NetworkFirst',
        options: {
          cacheName: 'tw-runs',
          networkTimeoutSeconds: 6,
          cacheableResponse: { statuses: [200] },
          expiration: { maxEntries: 50, maxAgeSeconds: 14 * 24 * 3600 },
          plugins: [markCachedAnswers],
        },
      },
      {
        urlPattern: ({ url, sameOrigin }) => sameOrigin && url.pathname === '/api/auth/session',
        method: 'GET',
        handler: 'NetworkFirst',
        options: { cacheName: 'tw-session', networkTimeoutSeconds: 6, cacheableResponse: { statuses: [200] }, plugins: [markCachedAnswers] },
      },
      {
        urlPattern: ({ url, sameOrigin }) => sameOrigin && url.pathname.startsWith('/api/files/'),
        method: 'GET',
        handler: 'CacheFirst',
        options: { cacheName: 'tw-files', cacheableResponse: { statuses: [200] }, expiration: { maxEntries: 300, maxAgeSeconds: 30 * 24 * 3600 } },
      },
    ],
  },
});

export default defineConfig({
  root,
  plugins: [react(), tailwindcss(), pwa, pwaIcon()],
  server: { proxy: apiProxy },
  preview: { proxy: apiProxy },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    rolldownOptions: {
      output: {
        // The core every page needs changes less often than our code, so it stays cached across
        // releases. Everything else follows the lazy routes that import it, so the tablet run view
        // never downloads the builder's drag and drop, the charts or the PDF renderer.
        codeSplitting: {
          groups: [{ name: 'core', test: /node_modules[\\/](react|react-dom|scheduler|react-router|@tanstack)[\\/]/ }],
        },
      },
    },
  },
  test: {
    name: 'frontend',
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./test/setup.ts'],
    restoreMocks: true,
    // Whole-page tests (lazy routes, forms, MSW) take seconds on a busy 2-core machine.
    testTimeout: 20_000,
  },
});
