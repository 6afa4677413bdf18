import type { Role } from '@tracewright/shared';

/**
 * Who does what with recipes, as the API decides it: engineers write (admins may step in),
 * quality releases or sends back. Everyone signed in may read.
 */
export const RECIPE_AUTHORS = ['engineer', 'admin'] as const satisfies readonly Role[];
export const RECIPE_REVIEWERS = ['quality'] as const satisfies readonly Role[];

export const canAuthor = (role: Role): boolean => (RECIPE_AUTHORS as readonly Role[]).includes(role);
export const canReview = (role: Role): boolean => (RECIPE_REVIEWERS as readonly Role[]).includes(role);
