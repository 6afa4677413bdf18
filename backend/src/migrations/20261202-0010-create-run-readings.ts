import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

// Columns a reading keeps for good once written; a correction adds a row instead.
const KEPT = ['run_id', 'step_id', 'spec_id', 'piece_id', 'value', 'unit', 'corrected_value', 'ambient_temp_c', 'instrument_id', 'out_of_limits', 'recorded_by', 'recorded_at', 'device_time', 'made_offline'];

/**
 * Readings taken during a run. A correction is a new row; the original only learns which row
 * replaced it and why. The triggers make that true for raw SQL too: nothing an operator
 * recorded can be changed or deleted.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' }, onDelete: 'RESTRICT' });
  await queryInterface.createTable('run_readings', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    step_id: { type: DataTypes.STRING(40), allowNull: false },
    spec_id: { type: DataTypes.STRING(40), allowNull: false },
    piece_id: ref('run_pieces', true),
    value: { type: DataTypes.DOUBLE, allowNull: false },
    // The spec's unit at the time, so the record reads the same if the recipe changes later.
    unit: { type: DataTypes.STRING(20), allowNull: false },
    corrected_value: { type: DataTypes.DOUBLE, allowNull: true },
    ambient_temp_c: { type: DataTypes.DOUBLE, allowNull: true },
    instrument_id: ref('instruments', true),
    out_of_limits: { type: DataTypes.BOOLEAN, allowNull: false },
    superseded_by_id: ref('run_readings', true),
    correction_reason: { type: DataTypes.STRING(1000), allowNull: true },
    recorded_by: ref('users'),
    recorded_at: { type: DataTypes.DATE(3), allowNull: false },
    device_time: { type: DataTypes.DATE(3), allowNull: true },
    made_offline: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
  });
  await queryInterface.addIndex('run_readings', ['run_id', 'recorded_at']);
  // Trends read one spec across runs, in time order.
  await queryInterface.addIndex('run_readings', ['spec_id', 'recorded_at']);

  const changed = KEPT.map((c) => `NOT (NEW.${c} <=> OLD.${c})`).join(' OR ');
  await sequelize.query(`CREATE TRIGGER run_readings_kept BEFORE UPDATE ON run_readings FOR EACH ROW
    BEGIN
      IF OLD.superseded_by_id IS NOT NULL OR ${changed} THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'recorded readings are kept as they were taken';
      END IF;
    END`);
  await sequelize.query(`CREATE TRIGGER run_readings_no_delete BEFORE DELETE ON run_readings FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'recorded readings are never deleted'`);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS run_readings_kept');
  await sequelize.query('DROP TRIGGER IF EXISTS run_readings_no_delete');
  await queryInterface.dropTable('run_readings');
}
