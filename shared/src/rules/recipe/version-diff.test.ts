import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import type { DraftContent } from '../../schemas/recipe.schema';
import { buildFortyStepRecipe, makeReadingSpec, makeSetup, steps } from './test-fixtures';
import { versionDiff } from './version-diff';

const draft = (recipeSteps: DraftContent['steps'], setup: Partial<DraftContent> = {}): DraftContent => ({ ...makeSetup(), steps: recipeSteps, ...setup });
const summary = (a: DraftContent, b: DraftContent) => versionDiff(a, b).steps.map((s) => `${s.stepId}:${s.status}`);

const T = steps.treatment('treat');
const P = steps.print('print');
const C = steps.cure('cure', { minutes: 20 });
const I = steps.inspect('look');

describe('versionDiff', () => {
  // prettier-ignore
  it.each([
    { name: 'nothing changes', a: [T, P, C], b: [T, P, C], expected: ['treat:unchanged', 'print:unchanged', 'cure:unchanged'] },
    { name: 'a step is inserted in the middle', a: [T, P, C], b: [T, I, P, C], expected: ['treat:unchanged', 'look:added', 'print:unchanged', 'cure:unchanged'] },
    { name: 'a step is removed', a: [T, P, C], b: [T, C], expected: ['treat:unchanged', 'print:removed', 'cure:unchanged'] },
    { name: 'the first step is removed', a: [T, P, C], b: [P, C], expected: ['treat:removed', 'print:unchanged', 'cure:unchanged'] },
    { name: 'the last step moves to the front', a: [T, P, C], b: [C, T, P], expected: ['cure:moved', 'treat:unchanged', 'print:unchanged'] },
    { name: 'a cure time changes', a: [T, P, C], b: [T, P, steps.cure('cure', { minutes: 30 })], expected: ['treat:unchanged', 'print:unchanged', 'cure:changed'] },
  ])('when $name, then the steps read $expected', ({ a, b, expected }) => {
    expect(summary(draft(a), draft(b))).toEqual(expected);
  });

  it('when a parameter changes, then its path and both values are listed', () => {
    const [, , cure] = versionDiff(draft([T, P, C]), draft([T, P, steps.cure('cure', { minutes: 30 })])).steps;
    expect(cure).toMatchObject({ beforeIndex: 2, afterIndex: 2, isMoved: false, changes: [{ path: 'params.minutes', before: 20, after: 30 }] });
  });

  it('when a step both moves and changes, then it is changed and flagged as moved', () => {
    const [first] = versionDiff(draft([T, P, C]), draft([steps.cure('cure', { minutes: 45 }), T, P])).steps;
    expect(first).toMatchObject({ stepId: 'cure', status: 'changed', isMoved: true, beforeIndex: 2, afterIndex: 0 });
  });

  it('when a reading spec limit changes, then the path names the spec by its id', () => {
    const before = steps.inspect('look', {}, { readingSpecs: [makeReadingSpec({ id: 'r-1', upperLimit: 5 })] });
    const after = steps.inspect('look', {}, { readingSpecs: [makeReadingSpec({ id: 'r-1', upperLimit: 4 })] });
    expect(versionDiff(draft([before]), draft([after])).steps[0]?.changes).toEqual([{ path: 'readingSpecs[r-1].upperLimit', before: 5, after: 4 }]);
  });

  // prettier-ignore
  it.each([
    { name: 'the substrate', b: { substrateId: 2 }, expected: [{ path: 'substrateId', before: 1, after: 2 }] },
    { name: 'a channel ink', b: { channelPlan: [{ channel: 'C1', inkId: 3 }] }, expected: [{ path: 'channelPlan[C1].inkId', before: 1, after: 3 }] },
    { name: 'an added channel', b: { channelPlan: [{ channel: 'C1', inkId: 1 }, { channel: 'C2', inkId: 2 }] }, expected: [{ path: 'channelPlan[C2]', before: null, after: { channel: 'C2', inkId: 2 } }] },
    { name: 'the heat sources', b: { heatSourceIds: [1, 2] }, expected: [{ path: 'heatSourceIds', before: [], after: [1, 2] }] },
  ])('when the setup changes $name, then the setup changes say so', ({ b, expected }) => {
    expect(versionDiff(draft([P]), draft([P], b)).setupChanges).toEqual(expected);
  });

  it('when a version is compared with itself, then everything is unchanged', () => {
    const stepPool = [T, P, C, I, steps.dry('dry'), steps.transfer('press'), steps.attach('parts')];
    fc.assert(
      fc.property(fc.shuffledSubarray(stepPool), (recipeSteps) => {
        const content = draft([...recipeSteps]);
        const diff = versionDiff(content, JSON.parse(JSON.stringify(content)) as DraftContent);
        expect(diff.setupChanges).toEqual([]);
        expect(diff.steps.every((s) => s.status === 'unchanged')).toBe(true);
      }),
    );
  });

  it('when steps are reordered, added and removed, then every step id of either version appears exactly once', () => {
    const pool = [...buildFortyStepRecipe().steps];
    fc.assert(
      fc.property(fc.shuffledSubarray(pool), fc.shuffledSubarray(pool), (a, b) => {
        const ids = versionDiff(draft([...a]), draft([...b])).steps.map((s) => s.stepId);
        expect(new Set(ids).size).toBe(ids.length);
        expect(new Set(ids)).toEqual(new Set([...a, ...b].map((s) => s.id)));
      }),
      { numRuns: 50 },
    );
  });
});
