import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * A deviation's history as review shows it: raised, assigned, severity changed, comments,
 * dispositions, closure, and refused signatures. Append-only (triggers), like the audit trail,
 * which keeps the full before/after of the same changes; this is the readable story.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await queryInterface.createTable('deviation_events', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    deviation_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'deviations', key: 'id' }, onDelete: 'RESTRICT' },
    // A string, not an ENUM: DeviationEventSchema's kinds are the gate.
    kind: { type: DataTypes.STRING(30), allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('deviation_events', ['deviation_id', 'id']);
  // Deviations raised before this table existed get their "raised" line from their own row.
  await sequelize.query(`INSERT INTO deviation_events (deviation_id, kind, text, by_id, at)
    SELECT id, 'created', title, created_by, created_at FROM deviations ORDER BY id`);
  await sequelize.query(`CREATE TRIGGER deviation_events_no_update BEFORE UPDATE ON deviation_events FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'deviation_events is append-only'`);
  await sequelize.query(`CREATE TRIGGER deviation_events_no_delete BEFORE DELETE ON deviation_events FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'deviation_events is append-only'`);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS deviation_events_no_update');
  await sequelize.query('DROP TRIGGER IF EXISTS deviation_events_no_delete');
  await queryInterface.dropTable('deviation_events');
}
