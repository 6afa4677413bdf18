import type { HeatSource } from '../../schemas/equipment.schema';
import type { Ink } from '../../schemas/material.schema';
import { STEP_KIND_LABELS, type RecipeStep, type StepKind } from '../../schemas/recipe-step.schema';
import { derivedSafetyNotes, type SafetyNote } from '../recipe/safety-notes';
import { readingLimitsText } from './reading-evaluation';
import { stepParameterTexts, stepTimeText } from './step-parameters';
import { quantityText } from './text-format';

export interface TravellerReading {
  id: string;
  name: string;
  unit: string;
  limitsText: string;
  targetText: string | null;
  required: boolean;
  perPiece: boolean;
}

export interface TravellerStep {
  number: number;
  stepId: string;
  kind: StepKind;
  kindLabel: string;
  title: string;
  /** Shortest–longest time, e.g. '10–15 min'; null when the recipe gives neither. */
  timeText: string | null;
  parameters: string[];
  readings: TravellerReading[];
  /** Derived cautions first, then the engineer's own notes; one per code. */
  cautions: SafetyNote[];
}

function cautionsOf(step: RecipeStep, context: { inks: readonly Ink[]; heatSources: readonly HeatSource[] }): SafetyNote[] {
  // The engineer's own notes get codes from their text, so a note typed twice shows once.
  const custom = step.safetyNotes.map((text): SafetyNote => ({ code: `custom:${text.trim().toLowerCase()}`, text, severity: 'caution' }));
  const seen = new Set<string>();
  return [...derivedSafetyNotes(step, context), ...custom].filter((note) => !seen.has(note.code) && seen.add(note.code));
}

/**
 * What the printed traveller and the run view show for each step: number, kind, title, time
 * window, key parameters with units, reading specs with their limits, and the cautions
 * (derived from heat, solvents and inks, plus the step's own notes, deduplicated by code).
 *
 * @example
 * travellerSteps([steps.cure('cure-1', { temperatureC: 150, minutes: 30 })], { inks: [], heatSources: [] })
 * // → [{ number: 1, stepId: 'cure-1', kind: 'cure', kindLabel: 'Cure', title: 'cure-1', timeText: null,
 * //      parameters: ['150 °C', '30 min at temperature'], readings: [], cautions: [{ code: 'hot-surface', … }] }]
 */
export function travellerSteps(
  steps: readonly RecipeStep[],
  context: { inks: readonly Ink[]; heatSources: readonly HeatSource[] },
): TravellerStep[] {
  return steps.map((step, index) => ({
    number: index + 1,
    stepId: step.id,
    kind: step.kind,
    kindLabel: STEP_KIND_LABELS[step.kind],
    title: step.title,
    timeText: stepTimeText(step),
    parameters: stepParameterTexts(step, context),
    readings: step.readingSpecs.map((spec) => ({
      id: spec.id,
      name: spec.name,
      unit: spec.unit,
      limitsText: readingLimitsText(spec),
      targetText: spec.target === null ? null : `target ${quantityText(spec.target, spec.unit)}`,
      required: spec.required,
      perPiece: spec.perPiece,
    })),
    cautions: cautionsOf(step, context),
  }));
}
