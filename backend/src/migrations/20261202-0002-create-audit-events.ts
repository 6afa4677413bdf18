import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * The audit trail is append-only. Triggers refuse UPDATE and DELETE for every account, so even
 * raw SQL through the application's connection cannot rewrite history.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await queryInterface.createTable('audit_events', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    at: { type: DataTypes.DATE(3), allowNull: false },
    actor_id: { type: DataTypes.INTEGER, allowNull: true },
    action: { type: DataTypes.STRING(60), allowNull: false },
    entity_type: { type: DataTypes.STRING(60), allowNull: false },
    entity_id: { type: DataTypes.STRING(60), allowNull: true },
    before_json: { type: DataTypes.JSON, allowNull: true },
    after_json: { type: DataTypes.JSON, allowNull: true },
    reason: { type: DataTypes.STRING(1000), allowNull: true },
    ip: { type: DataTypes.STRING(64), allowNull: true },
  });
  await queryInterface.addIndex('audit_events', ['entity_type', 'entity_id', 'id']);
  await queryInterface.addIndex('audit_events', ['actor_id', 'id']);
  await queryInterface.addIndex('audit_events', ['action', 'id']);
  await sequelize.query(`CREATE TRIGGER audit_events_no_update BEFORE UPDATE ON audit_events FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit_events is append-only'`);
  await sequelize.query(`CREATE TRIGGER audit_events_no_delete BEFORE DELETE ON audit_events FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit_events is append-only'`);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS audit_events_no_update');
  await sequelize.query('DROP TRIGGER IF EXISTS audit_events_no_delete');
  await queryInterface.dropTable('audit_events');
}
