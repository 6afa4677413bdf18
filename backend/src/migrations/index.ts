import * as createUsers from './20261202-0001-create-users';
import * as createAuditEvents from './20261202-0002-create-audit-events';
import * as createStoredFiles from './20261202-0003-create-stored-files';
import * as createMaterials from './20261202-0004-create-materials';
import * as createEquipment from './20261202-0005-create-equipment';
import * as createRecipes from './20261202-0006-create-recipes';
import * as createSignatures from './20261202-0007-create-signatures';

/**
 * Every migration, in order. Listed statically (not globbed) so they load the same way under
 * tsx, Vitest and any bundler. Add a new one at the end; never edit one that has shipped.
 */
export const MIGRATIONS = [
  { name: '20261202-0001-create-users', ...createUsers },
  { name: '20261202-0002-create-audit-events', ...createAuditEvents },
  { name: '20261202-0003-create-stored-files', ...createStoredFiles },
  { name: '20261202-0004-create-materials', ...createMaterials },
  { name: '20261202-0005-create-equipment', ...createEquipment },
  { name: '20261202-0006-create-recipes', ...createRecipes },
  { name: '20261202-0007-create-signatures', ...createSignatures },
];
