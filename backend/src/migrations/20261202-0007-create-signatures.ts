import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * E-signatures: who signed (and their name as printed then), what it means, when, and the exact
 * record version (entity plus the SHA-256 of its content). Append-only, like the audit trail.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await queryInterface.createTable('signatures', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    // A snapshot: renaming the account later must not change what the signature shows.
    printed_name: { type: DataTypes.STRING(120), allowNull: false },
    meaning: { type: DataTypes.STRING(60), allowNull: false },
    signed_at: { type: DataTypes.DATE(3), allowNull: false },
    entity_type: { type: DataTypes.STRING(40), allowNull: false },
    entity_id: { type: DataTypes.INTEGER, allowNull: false },
    content_hash: { type: DataTypes.CHAR(64), allowNull: false },
  });
  await queryInterface.addIndex('signatures', ['entity_type', 'entity_id']);
  await queryInterface.addIndex('signatures', ['user_id', 'signed_at']);
  await sequelize.query(`CREATE TRIGGER signatures_no_update BEFORE UPDATE ON signatures FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signatures are append-only'`);
  await sequelize.query(`CREATE TRIGGER signatures_no_delete BEFORE DELETE ON signatures FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'signatures are append-only'`);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS signatures_no_update');
  await sequelize.query('DROP TRIGGER IF EXISTS signatures_no_delete');
  await queryInterface.dropTable('signatures');
}
