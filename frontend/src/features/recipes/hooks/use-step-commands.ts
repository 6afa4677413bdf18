import { useCallback, useState, type Dispatch } from 'react';

import { STEP_KIND_LABELS, type Printer, type StepKind } from '@tracewright/shared';

import type { CardFocusTarget } from '../components/step-card-actions';
import type { DraftAction, DraftState } from '../utils/draft-reducer';
import { blankStep, duplicateOf } from '../utils/new-step';

export type FocusRequest = { stepId: string; target: CardFocusTarget } | null;

/**
 * Add, move, duplicate and remove steps, each said aloud in a polite live region, with the focus
 * put where the person's next press is expected.
 */
export function useStepCommands(draft: DraftState, dispatch: Dispatch<DraftAction>, printers: readonly Printer[]) {
  const [announcement, setAnnouncement] = useState('');
  const [focus, setFocus] = useState<FocusRequest>(null);
  const steps = draft.content.steps;
  const positionOf = (id: string) => steps.findIndex((s) => s.id === id);

  const addAt = (kind: StepKind, index: number) => {
    dispatch({ type: 'add-step', step: blankStep(kind, draft.content, printers), index });
    setAnnouncement(`Added ${STEP_KIND_LABELS[kind]} as step ${Math.min(index, steps.length) + 1} of ${steps.length + 1}; its form is open.`);
  };
  const add = (kind: StepKind) => {
    const selected = draft.selectedId === null ? -1 : positionOf(draft.selectedId);
    addAt(kind, selected === -1 ? steps.length : selected + 1);
  };
  const move = (id: string, toIndex: number, target?: CardFocusTarget) => {
    const step = steps[positionOf(id)];
    if (!step) return;
    dispatch({ type: 'move-step', id, toIndex });
    if (target) setFocus({ stepId: id, target });
    const to = Math.max(0, Math.min(toIndex, steps.length - 1));
    setAnnouncement(`Moved ${step.title} to position ${to + 1} of ${steps.length}.`);
  };
  const duplicate = (id: string) => {
    const index = positionOf(id);
    const step = steps[index];
    if (!step) return;
    dispatch({ type: 'add-step', step: duplicateOf(step), index: index + 1 });
    setAnnouncement(`Duplicated ${step.title} as step ${index + 2}; the copy is selected.`);
  };
  const remove = (id: string) => {
    const index = positionOf(id);
    const step = steps[index];
    if (!step) return;
    dispatch({ type: 'remove-step', id });
    const next = steps.filter((s) => s.id !== id)[Math.min(index, steps.length - 2)];
    if (next) setFocus({ stepId: next.id, target: 'select' });
    setAnnouncement(`Removed step ${index + 1}, ${step.title}. It goes for good when you save.`);
  };
  const select = useCallback((id: string) => dispatch({ type: 'select', id }), [dispatch]);
  const clearFocus = useCallback(() => setFocus(null), []);

  return { announcement, focus, clearFocus, add, addAt, move, duplicate, remove, select };
}
