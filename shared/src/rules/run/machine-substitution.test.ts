import { describe, expect, it } from 'vitest';

import type { DraftContent } from '../../schemas/recipe.schema';
import { makeSetup, steps } from '../recipe/test-fixtures';
import { substitutedContent, versionMachines } from './machine-substitution';

// Invented ids: the rule is plumbing over ids, no physical values involved.
const content: DraftContent = {
  ...makeSetup({ printerId: 1, heatSourceIds: [5, 6], treaterIds: [8] }),
  steps: [
    steps.treatment('plasma-1', { treaterId: 8 }),
    steps.print('print-1'),
    steps.dry('dry-1', { heatSourceId: 5 }),
    steps.cure('cure-1', { heatSourceId: 6 }),
    steps.transfer('press-1', { heatSourceId: 6 }),
  ],
};

describe('machines a version names', () => {
  it('when setup and steps name the same machine, then it is listed once', () => {
    expect(versionMachines(content)).toEqual([
      { kind: 'printer', id: 1 },
      { kind: 'heat-source', id: 5 },
      { kind: 'heat-source', id: 6 },
      { kind: 'surface-treater', id: 8 },
    ]);
  });
});

describe('a run using other machines than its version', () => {
  it('when no machine is substituted, then the content is the version’s own', () => {
    expect(substitutedContent(content, [])).toBe(content);
  });

  it('when oven 6 is replaced by oven 9, then the setup and every step that used 6 name 9 and nothing else moves', () => {
    const out = substitutedContent(content, [{ kind: 'heat-source', fromId: 6, id: 9 }]);
    expect(out.heatSourceIds).toEqual([5, 9]);
    expect(out.steps.map((s) => ('heatSourceId' in s.params ? s.params.heatSourceId : null))).toEqual([null, null, 5, 9, 9]);
    expect(out.printerId).toBe(1);
    expect(out.treaterIds).toEqual([8]);
  });

  it('when two version ovens are both replaced by one oven, then the setup lists it once', () => {
    const out = substitutedContent(content, [{ kind: 'heat-source', fromId: 5, id: 7 }, { kind: 'heat-source', fromId: 6, id: 7 }]);
    expect(out.heatSourceIds).toEqual([7]);
  });

  it('when a substitution names a machine kind the version uses under another id, then only that kind’s id is swapped', () => {
    const out = substitutedContent(content, [{ kind: 'printer', fromId: 5, id: 2 }]);
    expect(out.printerId).toBe(1);
    expect(out.heatSourceIds).toEqual([5, 6]);
  });
});
