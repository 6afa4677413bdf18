import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * Keys of tablet writes (the Idempotency-Key header) with the answer each got. The row is written
 * in the transaction of the write itself, so a key is never stored without its change, nor a
 * change without its key: a retried request finds the answer and replays it.
 */
export async function up({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.createTable('idempotency_keys', {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'RESTRICT' },
    // Not "key": a reserved word in MariaDB, and raw SQL should not need quoting to read it.
    idempotency_key: { type: DataTypes.STRING(100), allowNull: false },
    method: { type: DataTypes.STRING(10), allowNull: false },
    path: { type: DataTypes.STRING(300), allowNull: false },
    // SHA-256 of the method, path and body: the same key with another request is refused.
    request_hash: { type: DataTypes.CHAR(64), allowNull: false },
    // The key row is claimed first, so a twin request waits on it; these are filled in before
    // commit, so a committed row always has them (null only inside the writing transaction).
    status_code: { type: DataTypes.INTEGER, allowNull: true },
    response_body: { type: DataTypes.JSON, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('idempotency_keys', ['user_id', 'idempotency_key'], { unique: true });
  await queryInterface.addIndex('idempotency_keys', ['created_at']);
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.dropTable('idempotency_keys');
}
