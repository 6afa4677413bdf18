import type { DraftContent, RecipeStep, VersionSetup } from '@tracewright/shared';

/**
 * The builder's working copy of a version. `lockVersion` is the one this copy was loaded at, so a
 * save names it even after the server has moved on; `generation` changes whenever the whole copy
 * is replaced, so open forms start again from the new values.
 */
export type DraftState = {
  content: DraftContent;
  lockVersion: number;
  isDirty: boolean;
  selectedId: string | null;
  generation: number;
};

export type SetupChange = Partial<VersionSetup>;

export type DraftAction =
  | { type: 'load'; content: DraftContent; lockVersion: number }
  | { type: 'saved'; lockVersion: number; sent: DraftContent }
  | { type: 'set-setup'; change: SetupChange }
  | { type: 'add-step'; step: RecipeStep; index: number }
  | { type: 'update-step'; step: RecipeStep }
  | { type: 'remove-step'; id: string }
  | { type: 'move-step'; id: string; toIndex: number }
  | { type: 'select'; id: string | null };

export function initialDraft(content: DraftContent, lockVersion: number): DraftState {
  return { content, lockVersion, isDirty: false, selectedId: content.steps[0]?.id ?? null, generation: 0 };
}

const clamp = (n: number, max: number) => Math.max(0, Math.min(n, max));

function withSteps(state: DraftState, steps: RecipeStep[], selectedId = state.selectedId): DraftState {
  return { ...state, content: { ...state.content, steps }, isDirty: true, selectedId };
}

function moveStep(state: DraftState, id: string, toIndex: number): DraftState {
  const steps = [...state.content.steps];
  const from = steps.findIndex((s) => s.id === id);
  if (from === -1) return state;
  const to = clamp(toIndex, steps.length - 1);
  if (to === from) return state;
  const [moved] = steps.splice(from, 1);
  steps.splice(to, 0, moved as RecipeStep);
  return withSteps(state, steps);
}

function removeStep(state: DraftState, id: string): DraftState {
  const index = state.content.steps.findIndex((s) => s.id === id);
  if (index === -1) return state;
  const steps = state.content.steps.filter((s) => s.id !== id);
  // The step that takes its place (or the one above, at the end) stays selected.
  const neighbour = steps[Math.min(index, steps.length - 1)]?.id ?? null;
  return withSteps(state, steps, state.selectedId === id ? neighbour : state.selectedId);
}

export function draftReducer(state: DraftState, action: DraftAction): DraftState {
  switch (action.type) {
    case 'load': {
      const keep = action.content.steps.some((s) => s.id === state.selectedId);
      return {
        content: action.content,
        lockVersion: action.lockVersion,
        isDirty: false,
        selectedId: keep ? state.selectedId : (action.content.steps[0]?.id ?? null),
        generation: state.generation + 1,
      };
    }
    case 'saved':
      // Edits made while the save was on its way stay unsaved; the next save carries them.
      return { ...state, lockVersion: action.lockVersion, isDirty: state.content !== action.sent };
    case 'set-setup':
      return { ...state, content: { ...state.content, ...action.change }, isDirty: true };
    case 'add-step': {
      const steps = [...state.content.steps];
      steps.splice(clamp(action.index, steps.length), 0, action.step);
      return withSteps(state, steps, action.step.id);
    }
    case 'update-step':
      return withSteps(
        state,
        state.content.steps.map((s) => (s.id === action.step.id ? action.step : s)),
      );
    case 'remove-step':
      return removeStep(state, action.id);
    case 'move-step':
      return moveStep(state, action.id, action.toIndex);
    case 'select':
      return { ...state, selectedId: action.id };
  }
}
