import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * Departures from the recipe, raised automatically by the run rules or reported by hand. They
 * open as 'open'; review and disposition arrive with issue 6. Never deleted.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await queryInterface.createTable('deviations', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'runs', key: 'id' }, onDelete: 'RESTRICT' },
    step_id: { type: DataTypes.STRING(40), allowNull: true },
    // Strings, not ENUMs: the shared DEVIATION_RULES, severities and states are the gate.
    rule: { type: DataTypes.STRING(40), allowNull: false },
    severity: { type: DataTypes.STRING(10), allowNull: false },
    state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'open' },
    title: { type: DataTypes.STRING(400), allowNull: false },
    expected: { type: DataTypes.TEXT, allowNull: false },
    actual: { type: DataTypes.TEXT, allowNull: false },
    piece_ids: { type: DataTypes.JSON, allowNull: false },
    photo_file_ids: { type: DataTypes.JSON, allowNull: false },
    // The record that raised it (e.g. 'reading' 12, 'lot' 4), so review can open it.
    source_type: { type: DataTypes.STRING(30), allowNull: true },
    source_id: { type: DataTypes.INTEGER, allowNull: true },
    created_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  // The quality queue filters by state and severity, newest first; a run shows its own.
  await queryInterface.addIndex('deviations', ['state']);
  await queryInterface.addIndex('deviations', ['severity']);
  await queryInterface.addIndex('deviations', ['run_id', 'rule', 'source_type', 'source_id']);
  await queryInterface.addIndex('deviations', ['created_at']);
  await sequelize.query(`CREATE TRIGGER deviations_no_delete BEFORE DELETE ON deviations FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'deviations are never deleted'`);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS deviations_no_delete');
  await queryInterface.dropTable('deviations');
}
