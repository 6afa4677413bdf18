import type { Role } from '@tracewright/shared';

/**
 * Who may open each guarded page. The navigation and the route guards both read this, so a link
 * is shown exactly when its page would let the person in. The API checks again on every call.
 */
export const ROUTE_ROLES = {
  people: ['admin'],
  settings: ['admin'],
  devMail: ['admin'],
  audit: ['admin', 'quality'],
  // Everyone signed in reads materials and equipment; engineers and admins change them.
  catalogueEdit: ['admin', 'engineer'],
} as const satisfies Record<string, readonly Role[]>;
