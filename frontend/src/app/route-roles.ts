import { PERMISSIONS, type Role } from '@tracewright/shared';

/**
 * Who may open each guarded page, read from the shared permission table the API uses too. The
 * navigation and the route guards both read this, so a link is shown exactly when its page would
 * let the person in. The API checks again on every call.
 */
export const ROUTE_ROLES = {
  people: PERMISSIONS.managePeople,
  settings: PERMISSIONS.manageSettings,
  devMail: PERMISSIONS.readOutgoingMail,
  audit: PERMISSIONS.readAudit,
  quality: PERMISSIONS.readQuality,
  // Everyone signed in reads materials and equipment; engineers and admins change them.
  catalogueEdit: PERMISSIONS.editCatalogue,
} as const satisfies Record<string, readonly Role[]>;
