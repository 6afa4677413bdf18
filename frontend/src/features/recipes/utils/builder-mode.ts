import type { Role, VersionState } from '@tracewright/shared';

import { canAuthor, canReview } from '../recipe-roles';

export type BuilderMode = 'author' | 'review' | 'released' | 'read-only';

/**
 * What the builder offers this person for a version in this state: authors edit drafts, quality
 * reviews versions in review, authors start new versions from released or retired ones.
 * @example builderMode('draft', 'engineer') // → 'author'; builderMode('in-review', 'quality') // → 'review'
 */
export function builderMode(state: VersionState, role: Role): BuilderMode {
  if (state === 'draft' && canAuthor(role)) return 'author';
  if (state === 'in-review' && canReview(role)) return 'review';
  if ((state === 'released' || state === 'retired') && canAuthor(role)) return 'released';
  return 'read-only';
}
