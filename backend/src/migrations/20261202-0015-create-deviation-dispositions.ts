import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

// What a signed disposition decided stays as signed; only its verification is added later.
const KEPT = ['deviation_id', 'disposition', 'rationale', 'piece_ids', 'rework_step_ids', 'rework_run_id', 'corrective_action_note', 'corrective_action_owner_id', 'corrective_action_due_on', 'signature_id', 'created_by', 'created_at'];

/**
 * Dispositions: what happens to the pieces of a deviation, signed. A deviation may get several,
 * one per group of pieces. Rework opens a linked run (runs.rework_of_deviation_id) that repeats
 * the chosen steps of the same version on the same pieces (run_pieces.rework_of_piece_id); the
 * steps outside the rework are settled at planning as not needed (run_step_records.not_needed),
 * so the run completes by the ordinary rule once the chosen steps are done.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' }, onDelete: 'RESTRICT' });
  await queryInterface.addColumn('runs', 'rework_of_deviation_id', ref('deviations', true));
  await queryInterface.addColumn('run_pieces', 'rework_of_piece_id', ref('run_pieces', true));
  // A step outside a rework's scope: closed as not done at planning, without a deviation of its own.
  await queryInterface.addColumn('run_step_records', 'not_needed', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });

  await queryInterface.createTable('deviation_dispositions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    deviation_id: ref('deviations'),
    disposition: { type: DataTypes.STRING(30), allowNull: false },
    rationale: { type: DataTypes.TEXT, allowNull: false },
    piece_ids: { type: DataTypes.JSON, allowNull: false },
    rework_step_ids: { type: DataTypes.JSON, allowNull: false },
    rework_run_id: ref('runs', true),
    corrective_action_note: { type: DataTypes.TEXT, allowNull: true },
    corrective_action_owner_id: ref('users', true),
    corrective_action_due_on: { type: DataTypes.DATEONLY, allowNull: true },
    // Set when the deviation is closed: who verified the corrective action, when, and how.
    verified_at: { type: DataTypes.DATE(3), allowNull: true },
    verified_by: ref('users', true),
    verification_note: { type: DataTypes.TEXT, allowNull: true },
    signature_id: ref('signatures'),
    created_by: ref('users'),
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('deviation_dispositions', ['deviation_id', 'id']);

  const changed = KEPT.map((c) => `NOT (NEW.${c} <=> OLD.${c})`).join(' OR ');
  await sequelize.query(`CREATE TRIGGER deviation_dispositions_kept BEFORE UPDATE ON deviation_dispositions FOR EACH ROW
    BEGIN
      IF OLD.verified_at IS NOT NULL OR ${changed} THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signed dispositions are kept as signed';
      END IF;
    END`);
  await sequelize.query(`CREATE TRIGGER deviation_dispositions_no_delete BEFORE DELETE ON deviation_dispositions FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signed dispositions are never deleted'`);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS deviation_dispositions_kept');
  await sequelize.query('DROP TRIGGER IF EXISTS deviation_dispositions_no_delete');
  await queryInterface.dropTable('deviation_dispositions');
  await queryInterface.removeColumn('run_step_records', 'not_needed');
  await queryInterface.removeColumn('run_pieces', 'rework_of_piece_id');
  await queryInterface.removeColumn('runs', 'rework_of_deviation_id');
}
