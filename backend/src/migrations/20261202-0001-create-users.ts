import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

export async function up({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.ENUM('admin', 'engineer', 'operator', 'quality'), allowNull: false },
    status: { type: DataTypes.ENUM('invited', 'active', 'deactivated'), allowNull: false, defaultValue: 'invited' },
    password_hash: { type: DataTypes.STRING(255), allowNull: true },
    pin_hash: { type: DataTypes.STRING(255), allowNull: true },
    token_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    last_sign_in_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.createTable('one_time_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    purpose: { type: DataTypes.ENUM('invitation', 'password-reset'), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    used_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.createTable('lab_settings', {
    id: { type: DataTypes.INTEGER, primaryKey: true },
    lab_name: { type: DataTypes.STRING(120), allowNull: false },
    time_zone: { type: DataTypes.STRING(64), allowNull: false },
    paper_size: { type: DataTypes.ENUM('A4', 'Letter'), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.dropTable('lab_settings');
  await queryInterface.dropTable('one_time_tokens');
  await queryInterface.dropTable('users');
}
