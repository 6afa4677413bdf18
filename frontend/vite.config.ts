import { fileURLToPath } from 'node:url';

import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

// Pinned so `vite build` writes to frontend/dist whichever folder it is started from.
const root = fileURLToPath(new URL('.', import.meta.url));

// The backend sets cookies on its own origin; proxying /api keeps the app same-origin in
// development, which the double-submit CSRF cookie and `credentials: 'same-origin'` rely on.
const apiProxy = { '/api': { target: 'http://127.0.0.1:8080' } };

export default defineConfig({
  root,
  plugins: [react(), tailwindcss()],
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
