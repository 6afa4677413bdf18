import type { Role } from '../schemas/role.schema';

/**
 * Who may do what, in one place: the API's route table, the page guards, the navigation and the
 * buttons all read this table, so a button shows exactly when the API would accept its request.
 * Everyone signed in may read recipes, runs, materials and equipment.
 */
export const PERMISSIONS = {
  /** Invite people, change roles, deactivate accounts. */
  managePeople: ['admin'],
  manageSettings: ['admin'],
  /** The local mail fake's outbox (development and demo only). */
  readOutgoingMail: ['admin'],
  readAudit: ['admin', 'quality'],
  /** Materials, lots and equipment. */
  editCatalogue: ['admin', 'engineer'],
  /** Create recipes, edit drafts, submit for review (admins may step in). */
  authorRecipes: ['admin', 'engineer'],
  /** Release or send back a version in review, with an e-signature. */
  reviewRecipes: ['quality'],
  /** Plan, hold, resume and cancel runs from the desk. */
  planRuns: ['admin', 'engineer', 'quality'],
  /** Do the work of a run on the floor: steps, timers, readings, problems. */
  workRuns: ['admin', 'engineer', 'operator', 'quality'],
  /** Deviation queue, deviation detail, trends and the quality dashboard. */
  readQuality: ['admin', 'engineer', 'quality'],
  /** Assign, comment, disposition and close deviations; sign off runs; curate trends. */
  decideQuality: ['quality'],
  /** Send the open-deviation digest now. */
  sendDigest: ['admin', 'quality'],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof PERMISSIONS;

/** @example may('operator', 'planRuns') // → false */
export const may = (role: Role, permission: Permission): boolean => (PERMISSIONS[permission] as readonly Role[]).includes(role);
