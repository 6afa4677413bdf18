import type { RecipeStep } from '../../schemas/recipe-step.schema';
import type { RunState } from '../../schemas/run.schema';
import { type STEP_RECORD_STATES } from '../../schemas/run-views.schema';

export type StepRecordState = (typeof STEP_RECORD_STATES)[number];

export interface RunProgress {
  /** The step in progress, else the first step still pending; null once every step is settled. */
  currentStepId: string | null;
  /** The first pending step after the current one, in recipe order. */
  nextStepId: string | null;
  doneCount: number;
  /** Steps closed as not done (each with its reason and deviation). */
  notDoneCount: number;
  total: number;
  /** Every step is done or not done. */
  isComplete: boolean;
}

/**
 * Where a run stands. Steps without a record are pending; records of steps not in the list are
 * ignored. If the operator started a later step first, that step is the current one.
 *
 * @example
 * runProgress([a, b, c], [{ stepId: 'a', state: 'done' }, { stepId: 'b', state: 'in-progress' }])
 * // → { currentStepId: 'b', nextStepId: 'c', doneCount: 1, notDoneCount: 0, total: 3, isComplete: false }
 */
export function runProgress(
  steps: readonly Pick<RecipeStep, 'id'>[],
  records: readonly { stepId: string; state: StepRecordState }[],
): RunProgress {
  const stateOf = new Map(records.map((r) => [r.stepId, r.state]));
  const states = steps.map((s) => stateOf.get(s.id) ?? 'pending');
  const doneCount = states.filter((s) => s === 'done').length;
  const notDoneCount = states.filter((s) => s === 'not-done').length;
  let current = states.indexOf('in-progress');
  if (current === -1) current = states.indexOf('pending');
  const next = current === -1 ? -1 : states.findIndex((s, i) => i > current && s === 'pending');
  return {
    currentStepId: steps[current]?.id ?? null,
    nextStepId: steps[next]?.id ?? null,
    doneCount,
    notDoneCount,
    total: steps.length,
    isComplete: doneCount + notDoneCount === steps.length,
  };
}

function requireWhole(name: string, value: number, min: number): number {
  if (!Number.isInteger(value) || value < min) throw new RangeError(`${name} must be a whole number of ${min} or more; got ${value}.`);
  return value;
}

/**
 * A run's code: R-year-sequence, the sequence zero-padded to four digits (wider when it must be).
 * @example runCode(2026, 7) // → 'R-2026-0007'
 */
export function runCode(year: number, sequence: number): string {
  return `R-${requireWhole('Year', year, 1)}-${String(requireWhole('Sequence', sequence, 1)).padStart(4, '0')}`;
}

/**
 * One code per piece: the run code and a number zero-padded to the width of the quantity, at
 * least two digits, so the codes sort in order as text.
 * @example pieceCodes('R-2026-0007', 3) // → ['R-2026-0007-01', 'R-2026-0007-02', 'R-2026-0007-03']
 * @example pieceCodes('R-2026-0007', 120)[0] // → 'R-2026-0007-001'
 */
export function pieceCodes(code: string, quantity: number): string[] {
  const width = Math.max(2, String(requireWhole('Quantity', quantity, 1)).length);
  return Array.from({ length: quantity }, (_, i) => `${code}-${String(i + 1).padStart(width, '0')}`);
}

/**
 * The moves a run may make. Closing a completed run is quality's sign-off; closed and cancelled
 * runs are final.
 */
export const RUN_TRANSITIONS: Readonly<Record<RunState, readonly RunState[]>> = {
  planned: ['in-progress', 'on-hold', 'cancelled'],
  'in-progress': ['on-hold', 'completed', 'cancelled'],
  'on-hold': ['in-progress', 'cancelled'],
  completed: ['closed'],
  closed: [],
  cancelled: [],
};

/**
 * The states a run in `from` may move to.
 * @example allowedRunTransitions('on-hold') // → ['in-progress', 'cancelled']
 */
export function allowedRunTransitions(from: RunState): readonly RunState[] {
  return RUN_TRANSITIONS[from];
}

/**
 * Whether a run may move from one state to another (staying put is not a move).
 * @example canTransition('completed', 'in-progress') // → false
 */
export function canTransition(from: RunState, to: RunState): boolean {
  return RUN_TRANSITIONS[from].includes(to);
}
