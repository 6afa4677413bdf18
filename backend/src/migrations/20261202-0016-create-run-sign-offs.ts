import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * Quality's sign-off of a completed run's record: one per run (unique), pointing at its
 * signature (meaning "run record approved", over the hash of the record as signed). Append-only.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  const ref = (model: string) => ({ type: DataTypes.INTEGER, allowNull: false, references: { model, key: 'id' }, onDelete: 'RESTRICT' });
  await queryInterface.createTable('run_sign_offs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    signature_id: ref('signatures'),
    signed_by: ref('users'),
    signed_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  // The backstop for "signed off once": two quality people signing at the same moment.
  await queryInterface.addIndex('run_sign_offs', ['run_id'], { unique: true });
  await sequelize.query(`CREATE TRIGGER run_sign_offs_no_update BEFORE UPDATE ON run_sign_offs FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'run sign-offs are append-only'`);
  await sequelize.query(`CREATE TRIGGER run_sign_offs_no_delete BEFORE DELETE ON run_sign_offs FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'run sign-offs are append-only'`);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS run_sign_offs_no_update');
  await sequelize.query('DROP TRIGGER IF EXISTS run_sign_offs_no_delete');
  await queryInterface.dropTable('run_sign_offs');
}
