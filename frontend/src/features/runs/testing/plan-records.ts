import type { RecipeSummary, RecipeVersionView } from '@tracewright/shared';

import { aContent } from './run-fixtures';

export function aReleasedRecipe(overrides: Partial<RecipeSummary> = {}): RecipeSummary {
  return {
    id: 3,
    code: 'TRACE-1',
    name: 'Silver trace label',
    product: 'Demo trace label',
    notes: '',
    archived: false,
    version: 1,
    createdAt: '2026-11-30T09:00:00Z',
    updatedAt: '2026-11-30T09:00:00Z',
    latestVersion: { id: 11, number: 2, state: 'released' },
    releasedVersion: { id: 11, number: 2, state: 'released' },
    ...overrides,
  };
}

export function aReleasedVersion(overrides: Partial<RecipeVersionView> = {}): RecipeVersionView {
  return {
    id: 11,
    number: 2,
    state: 'released',
    author: { id: 1, name: 'Robin Vale' },
    changeNote: '',
    contentHash: 'a'.repeat(64),
    submittedAt: '2026-11-30T10:00:00Z',
    releasedAt: '2026-11-30T12:00:00Z',
    releasedBy: { id: 4, name: 'Tove Lind' },
    retiredAt: null,
    reviewComment: null,
    createdAt: '2026-11-30T09:00:00Z',
    updatedAt: '2026-11-30T12:00:00Z',
    recipeId: 3,
    recipe: { id: 3, code: 'TRACE-1', name: 'Silver trace label', product: 'Demo trace label' },
    content: aContent(),
    lockVersion: 4,
    submittedBy: { id: 1, name: 'Robin Vale' },
    signature: null,
    checks: [],
    summary: { pass: 0, warning: 0, blocked: 0, isBlocked: false },
    timeline: { totalMinutes: 0, handsOnMinutes: 0, waitingMinutes: 0, steps: [] },
    safetyNotes: [],
    ...overrides,
  };
}
