import { z } from 'zod';

import type { StepKind } from '../../schemas/recipe-step.schema';
import type { DraftContent } from '../../schemas/recipe.schema';
import { canonicalJson } from './canonical-json';
import { longestIncreasingRun } from './longest-increasing-run';

export const FieldChangeSchema = z.object({
  /** Dotted path; list items with an id (or a channel) are named by it: "readingSpecs[r-trace].upperLimit". */
  path: z.string(),
  /** null where the field did not exist on that side. */
  before: z.unknown(),
  after: z.unknown(),
});
export type FieldChange = z.infer<typeof FieldChangeSchema>;

export const STEP_DIFF_STATUSES = ['added', 'removed', 'moved', 'changed', 'unchanged'] as const;

export const StepDiffSchema = z.object({
  stepId: z.string(),
  kind: z.string(),
  title: z.string(),
  /** 'changed' wins over 'moved'; `isMoved` tells whether a changed step also moved. */
  status: z.enum(STEP_DIFF_STATUSES),
  isMoved: z.boolean(),
  beforeIndex: z.number().int().nullable(),
  afterIndex: z.number().int().nullable(),
  changes: z.array(FieldChangeSchema),
});
export type StepDiff = z.infer<typeof StepDiffSchema> & { kind: StepKind };

export const VersionDiffSchema = z.object({ setupChanges: z.array(FieldChangeSchema), steps: z.array(StepDiffSchema) });
export type VersionDiff = { setupChanges: FieldChange[]; steps: StepDiff[] };

const isRecord = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);
const join = (path: string, key: string) => (path ? `${path}.${key}` : key);

// Lists whose items carry one of these keys are matched item by item rather than as a whole.
const ITEM_KEYS = ['id', 'channel'] as const;

function itemKey(items: unknown[]): string | null {
  return ITEM_KEYS.find((k) => items.every((item) => isRecord(item) && typeof item[k] === 'string')) ?? null;
}

function diffLists(before: unknown[], after: unknown[], path: string, out: FieldChange[]): void {
  const key = before.length + after.length > 0 ? itemKey([...before, ...after]) : null;
  if (key === null) {
    if (canonicalJson(before) !== canonicalJson(after)) out.push({ path, before, after });
    return;
  }
  const byKey = (items: unknown[]) => new Map(items.map((item) => [(item as Record<string, string>)[key] as string, item]));
  const a = byKey(before);
  const b = byKey(after);
  for (const [k, item] of a) diffValues(item, b.has(k) ? b.get(k) : null, `${path}[${k}]`, out);
  for (const [k, item] of b) if (!a.has(k)) out.push({ path: `${path}[${k}]`, before: null, after: item });
  const order = (m: Map<string, unknown>, other: Map<string, unknown>) => [...m.keys()].filter((k) => other.has(k));
  const orderBefore = order(a, b);
  const orderAfter = order(b, a);
  if (orderBefore.join('\u0000') !== orderAfter.join('\u0000')) out.push({ path: `${path}#order`, before: orderBefore, after: orderAfter });
}

function diffValues(before: unknown, after: unknown, path: string, out: FieldChange[]): void {
  if (isRecord(before) && isRecord(after)) {
    const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
    for (const k of [...keys].sort()) diffValues(before[k] ?? null, after[k] ?? null, join(path, k), out);
  } else if (Array.isArray(before) && Array.isArray(after)) {
    diffLists(before, after, path, out);
  } else if (!Object.is(before, after) && canonicalJson(before) !== canonicalJson(after)) {
    out.push({ path, before, after });
  }
}

/**
 * Field-by-field changes between two values (objects by key, lists with ids by id, other lists whole).
 * @example fieldChanges({ a: 1, b: [1] }, { a: 2, b: [1] }) // → [{ path: 'a', before: 1, after: 2 }]
 */
export function fieldChanges(before: unknown, after: unknown): FieldChange[] {
  const out: FieldChange[] = [];
  diffValues(before, after, '', out);
  return out;
}

/**
 * What changed from version a to version b: setup fields, and each step matched by id as added,
 * removed, moved, changed or unchanged. "Moved" means its order relative to the other kept steps
 * changed (steps outside the longest run kept in order), so inserting one step does not mark
 * every step below it as moved. Removed steps are listed after the step that preceded them in a.
 *
 * @example
 * // a: [treat, print, cure]; b: [print, treat, cure*] with the cure's minutes 20 → 30
 * versionDiff(a, b).steps.map((s) => `${s.stepId}:${s.status}`) // → ['print:moved', 'treat:unchanged', 'cure:changed'] (a swap: one of the two is the mover)
 * // cure's changes → [{ path: 'params.minutes', before: 20, after: 30 }]
 */
export function versionDiff(a: DraftContent, b: DraftContent): VersionDiff {
  const { steps: stepsA, ...setupA } = a;
  const { steps: stepsB, ...setupB } = b;
  const indexA = new Map(stepsA.map((s, i) => [s.id, i]));
  const indexB = new Map(stepsB.map((s, i) => [s.id, i]));
  const kept = stepsB.filter((s) => indexA.has(s.id));
  const inOrder = new Set(longestIncreasingRun(kept.map((s) => indexA.get(s.id) as number)).map((i) => (kept[i] as { id: string }).id));

  const removedAfter = new Map<string | null, StepDiff[]>();
  let anchor: string | null = null;
  stepsA.forEach((s, i) => {
    if (indexB.has(s.id)) {
      anchor = s.id;
      return;
    }
    const entry: StepDiff = { stepId: s.id, kind: s.kind, title: s.title, status: 'removed', isMoved: false, beforeIndex: i, afterIndex: null, changes: [] };
    removedAfter.set(anchor, [...(removedAfter.get(anchor) ?? []), entry]);
  });

  const steps: StepDiff[] = [...(removedAfter.get(null) ?? [])];
  stepsB.forEach((s, i) => {
    const beforeIndex = indexA.get(s.id);
    if (beforeIndex === undefined) {
      steps.push({ stepId: s.id, kind: s.kind, title: s.title, status: 'added', isMoved: false, beforeIndex: null, afterIndex: i, changes: [] });
      return;
    }
    const changes = fieldChanges(stepsA[beforeIndex], s);
    const isMoved = !inOrder.has(s.id);
    const status = changes.length > 0 ? 'changed' : isMoved ? 'moved' : 'unchanged';
    steps.push({ stepId: s.id, kind: s.kind, title: s.title, status, isMoved, beforeIndex, afterIndex: i, changes });
    steps.push(...(removedAfter.get(s.id) ?? []));
  });
  return { setupChanges: fieldChanges(setupA, setupB), steps };
}
