import { may, PERMISSIONS } from '@tracewright/shared';

import { useSession } from '../../../lib/session';

/** Who may change materials and equipment (shared permission table). Everyone signed in may read. */
export const CATALOGUE_EDITORS = PERMISSIONS.editCatalogue;

export function useCanEditCatalogue(): boolean {
  return may(useSession().user.role, 'editCatalogue');
}
