import {
  checkSummary,
  derivedSafetyNotes,
  inkUsePerPiece,
  recipeChecks,
  recipeTimeline,
  RecipeStepSchema,
  type CheckSummary,
  type DraftContent,
  type ProcessCheck,
  type RecipeStep,
  type RecipeTimeline,
  type SafetyNote,
} from '@tracewright/shared';

import type { ProcessRecords } from '../api/get-process-records';

export type StepMarks = { blocked: number; warning: number };

/** Everything the builder shows about a draft, worked out by the shared rules. */
export type DraftEvaluation = {
  checks: ProcessCheck[];
  summary: CheckSummary;
  timeline: RecipeTimeline;
  /** Steps whose fields do not parse yet: the rules leave them out until they do. */
  invalidStepIds: ReadonlySet<string>;
  marks: ReadonlyMap<string, StepMarks>;
  safetyNotes: ReadonlyMap<string, SafetyNote[]>;
  /** µL of ink one piece takes in each print pass that has its area and printed fraction. */
  inkUse: ReadonlyMap<string, number>;
};

function marksOf(checks: readonly ProcessCheck[]): Map<string, StepMarks> {
  const marks = new Map<string, StepMarks>();
  for (const check of checks) {
    if (check.stepId === null || check.status === 'pass') continue;
    const mark = marks.get(check.stepId) ?? { blocked: 0, warning: 0 };
    mark[check.status] += 1;
    marks.set(check.stepId, mark);
  }
  return marks;
}

/**
 * Runs the shared rules over the builder's working copy. Steps that do not parse yet are left out
 * (and listed), because the rules are typed by the schema and trust what it lets through.
 */
export function evaluateDraft(content: DraftContent, records: ProcessRecords): DraftEvaluation {
  const steps: RecipeStep[] = [];
  const invalidStepIds = new Set<string>();
  for (const step of content.steps) {
    const parsed = RecipeStepSchema.safeParse(step);
    if (parsed.success) steps.push(parsed.data);
    else invalidStepIds.add(step.id);
  }
  const { inks, substrates, printers, heatSources } = records;
  const checks = recipeChecks({ setup: content, steps, inks, substrates, printers, heatSources });
  const printer = printers.find((p) => p.id === content.printerId);
  const inkUse = new Map<string, number>();
  const safetyNotes = new Map<string, SafetyNote[]>();
  for (const step of steps) {
    safetyNotes.set(step.id, derivedSafetyNotes(step, { inks, heatSources }));
    if (step.kind !== 'print-pass' || !printer) continue;
    const ink = inks.find((i) => i.id === step.params.inkId);
    const use = ink ? inkUsePerPiece(step, ink, printer) : null;
    if (use !== null) inkUse.set(step.id, use);
  }
  return { checks, summary: checkSummary(checks), timeline: recipeTimeline(steps), invalidStepIds, marks: marksOf(checks), safetyNotes, inkUse };
}
