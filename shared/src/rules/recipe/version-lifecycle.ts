import type { VersionState } from '../../schemas/recipe.schema';
import { stateInWords } from '../state-words';

/** What can happen to a recipe version, and the state it must be in for that. */
export const VERSION_MOVES = {
  save: { from: 'draft', to: 'draft', doing: 'edited' },
  submit: { from: 'draft', to: 'in-review', doing: 'submitted' },
  release: { from: 'in-review', to: 'released', doing: 'released' },
  'send-back': { from: 'in-review', to: 'draft', doing: 'sent back' },
} as const satisfies Record<string, { from: VersionState; to: VersionState; doing: string }>;
export type VersionMove = keyof typeof VERSION_MOVES;

/**
 * Why a version in `state` cannot take `move`, in words for the person who tried; null when it
 * can. Released and retired versions are frozen: the record of what was made must not change.
 */
export function versionMoveRefusal(state: VersionState, move: VersionMove, versionNumber: number): string | null {
  const { from, doing } = VERSION_MOVES[move];
  if (state === from) return null;
  const now = state === 'in-review' ? 'is already in review' : `is ${stateInWords(state)}`;
  return `Version ${versionNumber} ${now}, so it cannot be ${doing}. Reload to see where it stands.`;
}

export interface VersionContributors {
  authorId: number;
  /** Everyone who created, saved or submitted the version (from its audit trail). */
  contributorIds: readonly number[];
}

/**
 * Separation of duties on release: nobody approves a version they authored, edited or
 * submitted (21 CFR 11 and GMP practice expect review by a second person). Null when allowed.
 */
export function approvalRefusal(version: VersionContributors, approverId: number, versionNumber: number): string | null {
  const who = `version ${versionNumber}`;
  if (version.authorId === approverId) return `You are the author of ${who}, and an author may not approve their own version. Ask another quality person to release it.`;
  if (version.contributorIds.includes(approverId)) return `You edited or submitted ${who}, so you may not approve it. Ask another quality person to release it.`;
  return null;
}
