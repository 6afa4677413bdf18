import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

export async function up({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.createTable('stored_files', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    storage_key: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    display_name: { type: DataTypes.STRING(200), allowNull: false },
    content_type: { type: DataTypes.STRING(100), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    uploaded_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.dropTable('stored_files');
}
