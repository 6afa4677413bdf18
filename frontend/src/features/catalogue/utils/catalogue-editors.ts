import type { Role } from '@tracewright/shared';

import { useSession } from '../../../lib/session';

/**
 * Who may change materials and equipment: the same list as `ROUTE_ROLES.catalogueEdit` in app/
 * (features may not import app/) and the API's own check. Everyone signed in may read.
 */
export const CATALOGUE_EDITORS: readonly Role[] = ['admin', 'engineer'];

export function useCanEditCatalogue(): boolean {
  return CATALOGUE_EDITORS.includes(useSession().user.role);
}
