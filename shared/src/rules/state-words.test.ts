import { describe, expect, it } from 'vitest';

import { DEVIATION_STATES, RUN_STATES } from '../schemas/run.schema';
import { STEP_RECORD_STATES } from '../schemas/run-views.schema';
import { VERSION_STATES } from '../schemas/recipe.schema';
import { stateInWords } from './state-words';

describe('stateInWords', () => {
  it('when a state has joined words, then they read apart', () => {
    expect(stateInWords('in-progress')).toBe('in progress');
    expect(stateInWords('not-done')).toBe('not done');
    expect(stateInWords('closed')).toBe('closed');
  });

  it('when any stored state is put in words, then no hyphen is left', () => {
    for (const state of [...RUN_STATES, ...DEVIATION_STATES, ...STEP_RECORD_STATES, ...VERSION_STATES]) expect(stateInWords(state)).not.toContain('-');
  });
});
