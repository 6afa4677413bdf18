import { QueryTypes, type Sequelize } from 'sequelize';

import type { HostileWorld } from './hostile-world';

/**
 * Refusals that are recorded on purpose even though the request fails: a wrong password at
 * sign-in, a wrong PIN, a wrong password under a signature. Everything else must roll back.
 */
const AUDITED_REFUSALS = ['auth.sign-in-failed', 'auth.pin-failed', 'signature.refused'];

const CATALOGUE_TABLES = ['inks', 'substrates', 'material_lots', 'printers', 'heat_sources', 'surface_treaters', 'instruments'] as const;

/**
 * One query that changes when anything the hostile world owns is written: its actors' audit
 * rows, idempotency keys and uploads, the rows under its run, and a fingerprint of every row it
 * points at. Scoped to the world's own rows, since other test files write to the same database.
 */
export function writeSnapshot(sequelize: Sequelize, world: HostileWorld): (options?: { withLabSettings?: boolean }) => Promise<string> {
  const actors = [...Object.values(world.sessions), world.visitor].map((s) => s.user.id);
  const people = [...actors, world.targetUserId, world.pinUserId];
  const r = world.records;
  const catalogueIds: Record<(typeof CATALOGUE_TABLES)[number], number> = {
    inks: r.inkId,
    substrates: r.substrateId,
    material_lots: world.lotId,
    printers: r.printerId,
    heat_sources: r.ovenId,
    surface_treaters: r.treaterId,
    instruments: r.instrumentId,
  };
  const fingerprint = (table: string, ids: string, columns: string) =>
    `(SELECT MD5(GROUP_CONCAT(CONCAT_WS('|', ${columns}) ORDER BY id)) FROM ${table} WHERE id IN (${ids}))`;
  const sql = `SELECT CONCAT_WS(' ',
    (SELECT COUNT(*) FROM audit_events WHERE actor_id IN (:actors) AND action NOT IN (:refusals)),
    (SELECT COUNT(*) FROM idempotency_keys WHERE user_id IN (:actors)),
    (SELECT COUNT(*) FROM stored_files WHERE uploaded_by IN (:actors)),
    (SELECT COUNT(*) FROM runs WHERE created_by IN (:actors)),
    (SELECT COUNT(*) FROM run_readings WHERE run_id = :runId),
    (SELECT COUNT(*) FROM run_timers WHERE run_id = :runId),
    (SELECT COUNT(*) FROM deviations WHERE run_id = :runId),
    (SELECT COUNT(*) FROM recipe_versions WHERE recipe_id IN (:recipes)),
    ${fingerprint('users', ':people', "id, updated_at, role, status, token_version, IFNULL(pin_hash, '-'), password_hash")},
    ${fingerprint('runs', ':runs', 'id, updated_at, version, state')},
    ${fingerprint('run_step_records', 'SELECT id FROM run_step_records WHERE run_id = :runId', 'id, updated_at, state')},
    ${fingerprint('deviations', ':deviationId', 'id, updated_at, state')},
    ${fingerprint('recipes', ':recipes', 'id, updated_at, version')},
    ${fingerprint('recipe_versions', ':versions', 'id, updated_at, lock_version, state')},
    ${CATALOGUE_TABLES.map((table) => fingerprint(table, String(catalogueIds[table]), 'id, updated_at, version')).join(',\n    ')}
  ) AS snapshot`;
  // The lab's one settings row is shared by every world, so only the settings route's run watches it.
  const settingsSql = "SELECT MD5(GROUP_CONCAT(CONCAT_WS('|', lab_name, time_zone, paper_size))) AS snapshot FROM lab_settings";
  const replacements = {
    actors,
    people,
    refusals: AUDITED_REFUSALS,
    runId: world.runId,
    runs: [world.runId, world.spareRunId],
    deviationId: world.deviationId,
    recipes: [world.recipeId, world.releasedRecipeId],
    versions: [world.draftId, world.releasedVersionId],
  };
  const read = async (query: string) => (await sequelize.query<{ snapshot: string }>(query, { replacements, type: QueryTypes.SELECT }))[0]?.snapshot ?? '';
  return async ({ withLabSettings = false } = {}) => (withLabSettings ? `${await read(sql)} ${await read(settingsSql)}` : read(sql));
}
