import * as createUsers from './20261202-0001-create-users';
import * as createAuditEvents from './20261202-0002-create-audit-events';
import * as createStoredFiles from './20261202-0003-create-stored-files';
import * as createMaterials from './20261202-0004-create-materials';
import * as createEquipment from './20261202-0005-create-equipment';
import * as createRecipes from './20261202-0006-create-recipes';
import * as createSignatures from './20261202-0007-create-signatures';
import * as createRuns from './20261202-0008-create-runs';
import * as createRunStepRecords from './20261202-0009-create-run-step-records';
import * as createRunReadings from './20261202-0010-create-run-readings';
import * as createDeviations from './20261202-0011-create-deviations';
import * as createIdempotencyKeys from './20261202-0012-create-idempotency-keys';
import * as addDeviationReview from './20261202-0013-add-deviation-review';
import * as createDeviationEvents from './20261202-0014-create-deviation-events';
import * as createDeviationDispositions from './20261202-0015-create-deviation-dispositions';
import * as createRunSignOffs from './20261202-0016-create-run-sign-offs';
import * as createTrendNotes from './20261202-0017-create-trend-notes';
import * as rebuildDeviationTextIndex from './20261202-0018-rebuild-deviation-text-index';

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
  { name: '20261202-0008-create-runs', ...createRuns },
  { name: '20261202-0009-create-run-step-records', ...createRunStepRecords },
  { name: '20261202-0010-create-run-readings', ...createRunReadings },
  { name: '20261202-0011-create-deviations', ...createDeviations },
  { name: '20261202-0012-create-idempotency-keys', ...createIdempotencyKeys },
  { name: '20261202-0013-add-deviation-review', ...addDeviationReview },
  { name: '20261202-0014-create-deviation-events', ...createDeviationEvents },
  { name: '20261202-0015-create-deviation-dispositions', ...createDeviationDispositions },
  { name: '20261202-0016-create-run-sign-offs', ...createRunSignOffs },
  { name: '20261202-0017-create-trend-notes', ...createTrendNotes },
  { name: '20261202-0018-rebuild-deviation-text-index', ...rebuildDeviationTextIndex },
];
