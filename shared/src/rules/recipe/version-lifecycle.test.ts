import { describe, expect, it } from 'vitest';

import { VERSION_STATES } from '../../schemas/recipe.schema';
import { approvalRefusal, VERSION_MOVES, versionMoveRefusal, type VersionMove } from './version-lifecycle';

describe('recipe version moves', () => {
  it('when each move is asked of each state, then only its own starting state allows it', () => {
    for (const move of Object.keys(VERSION_MOVES) as VersionMove[]) {
      for (const state of VERSION_STATES) {
        const refusal = versionMoveRefusal(state, move, 3);
        if (state === VERSION_MOVES[move].from) expect(refusal, `${move} from ${state}`).toBeNull();
        else expect(refusal, `${move} from ${state}`).toMatch(/^Version 3 is .*, so it cannot be .*\. Reload/);
      }
    }
  });

  it('when a released or retired version is asked to change in any way, then it is refused', () => {
    for (const state of ['released', 'retired'] as const) {
      for (const move of Object.keys(VERSION_MOVES) as VersionMove[]) expect(versionMoveRefusal(state, move, 1)).not.toBeNull();
    }
  });

  it('when a version in review is submitted again, then the refusal says it is already in review', () => {
    expect(versionMoveRefusal('in-review', 'submit', 2)).toBe('Version 2 is already in review, so it cannot be submitted. Reload to see where it stands.');
  });
});

describe('who may approve a version', () => {
  const version = { authorId: 10, contributorIds: [10, 11] };
  it('when the author approves, then it is refused as the author', () => {
    expect(approvalRefusal(version, 10, 4)).toMatch(/You are the author of version 4/);
  });
  it('when someone who edited or submitted it approves, then it is refused', () => {
    expect(approvalRefusal(version, 11, 4)).toMatch(/You edited or submitted version 4/);
  });
  it('when a second person approves, then it is allowed', () => {
    expect(approvalRefusal(version, 12, 4)).toBeNull();
  });
});
