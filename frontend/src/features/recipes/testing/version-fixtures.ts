import type { DraftContent, RecipeStep, RecipeDetail, RecipeVersionView, VersionSummary } from '@tracewright/shared';

import { aDraftContent, BLANK_STEP_FIELDS } from '../../../../test/draft-content';

// Invented demo recipe for the builder's tests: a silver trace printed on PET and cured in an oven.

export const PRINT_STEP: RecipeStep = {
  ...BLANK_STEP_FIELDS,
  id: 'print-silver',
  kind: 'print-pass',
  title: 'Print silver traces',
  params: { inkId: 1, channel: 'C1', artworkFileId: null, dpi: 1000, passes: 1, platenTempC: null, nozzleCheckRequired: true, printedAreaFraction: null, pieceAreaMm2: null },
};

export const CURE_STEP: RecipeStep = {
  ...BLANK_STEP_FIELDS,
  id: 'cure-silver',
  kind: 'cure',
  title: 'Cure silver',
  params: { heatSourceId: 1, temperatureC: 120, minutes: 30, rampCPerMinute: null },
};

export const INSPECT_STEP: RecipeStep = {
  ...BLANK_STEP_FIELDS,
  id: 'inspect-traces',
  kind: 'inspect',
  title: 'Look over the traces',
  params: { lookFor: 'Breaks and bridges', measure: '' },
};

export function aContent(overrides: Partial<DraftContent> = {}): DraftContent {
  return aDraftContent([PRINT_STEP, CURE_STEP, INSPECT_STEP], overrides);
}

export const ENGINEER = { id: 1, name: 'Robin Vale' };
export const OTHER_ENGINEER = { id: 5, name: 'Cleo Ferrand' };

export function aVersionSummary(overrides: Partial<VersionSummary> = {}): VersionSummary {
  return {
    id: 11,
    number: 1,
    state: 'draft',
    author: ENGINEER,
    changeNote: '',
    contentHash: 'a'.repeat(64),
    submittedAt: null,
    releasedAt: null,
    releasedBy: null,
    retiredAt: null,
    reviewComment: null,
    createdAt: '2026-11-30T09:00:00Z',
    updatedAt: '2026-11-30T09:00:00Z',
    ...overrides,
  };
}

export function aVersionView(overrides: Partial<RecipeVersionView> = {}): RecipeVersionView {
  return {
    ...aVersionSummary(),
    recipeId: 1,
    recipe: { id: 1, code: 'TRACE-1', name: 'Silver trace label', product: 'Demo trace label' },
    content: aContent(),
    lockVersion: 3,
    submittedBy: null,
    signature: null,
    // The builder works these out live; the server's copies are not read.
    checks: [],
    summary: { pass: 0, warning: 0, blocked: 0, isBlocked: false },
    timeline: { totalMinutes: 0, handsOnMinutes: 0, waitingMinutes: 0, steps: [] },
    safetyNotes: [],
    ...overrides,
  };
}

export function aRecipeDetail(versions: VersionSummary[] = [aVersionSummary()]): RecipeDetail {
  const latest = versions[0] ?? null;
  const released = versions.find((v) => v.state === 'released') ?? null;
  const ref = (v: VersionSummary | null) => (v ? { id: v.id, number: v.number, state: v.state } : null);
  return {
    id: 1,
    code: 'TRACE-1',
    name: 'Silver trace label',
    product: 'Demo trace label',
    notes: '',
    archived: false,
    version: 1,
    createdAt: '2026-11-30T09:00:00Z',
    updatedAt: '2026-11-30T09:00:00Z',
    latestVersion: ref(latest),
    releasedVersion: ref(released),
    versions,
  };
}
