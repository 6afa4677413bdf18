import { readdirSync } from 'node:fs';
import { join } from 'node:path';

import js from '@eslint/js';
import checkFile from 'eslint-plugin-check-file';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import tseslint from 'typescript-eslint';

// Every folder under frontend/src/features is a feature: none may import another.
const FEATURES = readdirSync(join(import.meta.dirname, 'frontend', 'src', 'features'), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

export default tseslint.config(
  {
    ignores: ['**/node_modules/**', '**/dist/**', '.data/**', '.tmp/**', 'e2e/test-results/**', 'e2e/output/**', 'e2e/playwright-report/**'],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    plugins: { 'import-x': importX, 'check-file': checkFile },
    rules: {
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'import-x/order': [
        'error',
        {
          groups: ['builtin', 'external', 'internal', ['parent', 'sibling', 'index']],
          pathGroups: [{ pattern: '@tracewright/**', group: 'internal' }],
          pathGroupsExcludedImportTypes: ['builtin'],
          'newlines-between': 'always',
        },
      ],
      'check-file/filename-naming-convention': ['error', { '**/*.{ts,tsx}': 'KEBAB_CASE' }, { ignoreMiddleExtensions: true }],
      'check-file/folder-naming-convention': ['error', { '{shared,backend,frontend,e2e,scripts}/**/': 'KEBAB_CASE' }],
    },
  },
  {
    // Migrations are named by date so they sort in the order they run.
    files: ['backend/src/migrations/*.ts'],
    rules: { 'check-file/filename-naming-convention': 'off' },
  },
  {
    // The pure core: shared/ may import only zod (tests may also use their runner and fast-check).
    files: ['shared/src/**/*.ts'],
    ignores: ['shared/src/**/*.test.ts', 'shared/src/**/test-support.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ regex: '^(?!zod$|\\.{1,2}/).*', message: 'shared/ is pure: import only zod and its own files.' }] },
      ],
    },
  },
  {
    // One-way imports in the frontend: lib/components -> features -> app; features never import each other.
    files: ['frontend/src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './frontend/src/lib', from: ['./frontend/src/features', './frontend/src/app'] },
            { target: './frontend/src/components', from: ['./frontend/src/features', './frontend/src/app'] },
            { target: './frontend/src/features', from: './frontend/src/app' },
            ...FEATURES.map(
              (feature) => ({
                target: `./frontend/src/features/${feature}`,
                from: './frontend/src/features',
                except: [`./${feature}`],
              }),
            ),
          ],
        },
      ],
    },
  },
  {
    files: ['backend/src/**/*.ts'],
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        { zones: [{ target: './backend/src', from: ['./frontend', './e2e'] }] },
      ],
    },
  },
);
