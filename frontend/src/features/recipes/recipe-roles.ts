import { may, type Role } from '@tracewright/shared';

/**
 * Who does what with recipes, as the API decides it (shared permission table): engineers write
 * (admins may step in), quality releases or sends back. Everyone signed in may read.
 */
export const canAuthor = (role: Role): boolean => may(role, 'authorRecipes');
export const canReview = (role: Role): boolean => may(role, 'reviewRecipes');
