import { defineConfig } from 'vitest/config';

// One runner for the three unit/API suites; `npm test` (scripts/test.ts) provides the database.
export default defineConfig({
  test: {
    projects: ['shared', 'backend', 'frontend'],
  },
});
