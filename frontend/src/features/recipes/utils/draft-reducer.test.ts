import { describe, expect, it } from 'vitest';

import { aContent, CURE_STEP, INSPECT_STEP, PRINT_STEP } from '../testing/version-fixtures';
import { draftReducer, initialDraft } from './draft-reducer';

const ids = (state: ReturnType<typeof initialDraft>) => state.content.steps.map((s) => s.id);

describe('draftReducer', () => {
  it('when a draft is opened, then the first step is selected and nothing is unsaved', () => {
    const state = initialDraft(aContent(), 3);
    expect(state).toMatchObject({ selectedId: PRINT_STEP.id, isDirty: false, lockVersion: 3 });
  });

  it('when a step is moved past the end, then it lands last and the draft is unsaved', () => {
    const state = draftReducer(initialDraft(aContent(), 3), { type: 'move-step', id: PRINT_STEP.id, toIndex: 99 });
    expect(ids(state)).toEqual([CURE_STEP.id, INSPECT_STEP.id, PRINT_STEP.id]);
    expect(state.isDirty).toBe(true);
  });

  it('when the selected step is removed, then the step that takes its place is selected', () => {
    const state = draftReducer(initialDraft(aContent(), 3), { type: 'remove-step', id: PRINT_STEP.id });
    expect(ids(state)).toEqual([CURE_STEP.id, INSPECT_STEP.id]);
    expect(state.selectedId).toBe(CURE_STEP.id);
  });

  it('when a save comes back and nothing was typed meanwhile, then the draft is clean at the new lock version', () => {
    const edited = draftReducer(initialDraft(aContent(), 3), { type: 'set-setup', change: { changeNote: 'Warmer cure' } });
    const saved = draftReducer(edited, { type: 'saved', lockVersion: 4, sent: edited.content });
    expect(saved).toMatchObject({ isDirty: false, lockVersion: 4 });
  });

  it('when a save comes back after more typing, then the newer edits stay unsaved', () => {
    const edited = draftReducer(initialDraft(aContent(), 3), { type: 'set-setup', change: { changeNote: 'Warmer' } });
    const more = draftReducer(edited, { type: 'set-setup', change: { changeNote: 'Warmer cure' } });
    const saved = draftReducer(more, { type: 'saved', lockVersion: 4, sent: edited.content });
    expect(saved).toMatchObject({ isDirty: true, lockVersion: 4 });
  });

  it('when another copy is loaded, then the forms start again and the selection stays if the step still exists', () => {
    const selected = draftReducer(initialDraft(aContent(), 3), { type: 'select', id: CURE_STEP.id });
    const loaded = draftReducer(selected, { type: 'load', content: aContent(), lockVersion: 5 });
    expect(loaded).toMatchObject({ selectedId: CURE_STEP.id, generation: 1, lockVersion: 5, isDirty: false });
  });
});
