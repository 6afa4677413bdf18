import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * Runs: a released recipe version made N times, with its pieces and the lots and machines it
 * actually uses. Runs are never deleted (their records are the lab's evidence), hence RESTRICT.
 */
export async function up({ context: { queryInterface } }: { context: MigrationContext }) {
  const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' }, onDelete: 'RESTRICT' });

  await queryInterface.createTable('runs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    code: { type: DataTypes.STRING(20), allowNull: false, unique: true },
    // Kept beside the version (which names it too) so lists filter by recipe without reading content.
    recipe_id: ref('recipes'),
    version_id: ref('recipe_versions'),
    // A string, not an ENUM: the shared RUN_STATES list is the gate.
    state: { type: DataTypes.STRING(20), allowNull: false },
    quantity: { type: DataTypes.INTEGER, allowNull: false },
    due_on: { type: DataTypes.DATEONLY, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: false },
    hold_reason: { type: DataTypes.STRING(1000), allowNull: true },
    // Bumped by every state change, so a screen holding an older one can tell.
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    created_by: ref('users', true),
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('runs', ['state', 'created_at']);
  await queryInterface.addIndex('runs', ['recipe_id']);

  // One counter row per year: the upsert takes a row lock, so two plans never share a code.
  await queryInterface.createTable('run_sequences', {
    year: { type: DataTypes.INTEGER, primaryKey: true },
    last_value: { type: DataTypes.INTEGER, allowNull: false },
  });

  await queryInterface.createTable('run_pieces', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    number: { type: DataTypes.INTEGER, allowNull: false },
    code: { type: DataTypes.STRING(30), allowNull: false, unique: true },
  });
  await queryInterface.addIndex('run_pieces', ['run_id', 'number'], { unique: true });

  await queryInterface.createTable('run_lots', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    lot_id: ref('material_lots'),
    // Why a flagged lot (expired, past pot life) was used anyway; null for a lot without flags.
    reason: { type: DataTypes.STRING(1000), allowNull: true },
  });
  await queryInterface.addIndex('run_lots', ['run_id', 'lot_id'], { unique: true });

  // kind + equipment_id point at one of four tables, so the service checks existence.
  await queryInterface.createTable('run_equipment', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    kind: { type: DataTypes.STRING(20), allowNull: false },
    equipment_id: { type: DataTypes.INTEGER, allowNull: false },
    // The version's machine this one stands in for; null when it is the version's own, or an extra.
    replaces_id: { type: DataTypes.INTEGER, allowNull: true },
    reason: { type: DataTypes.STRING(1000), allowNull: true },
  });
  await queryInterface.addIndex('run_equipment', ['run_id', 'kind', 'equipment_id'], { unique: true });
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.dropTable('run_equipment');
  await queryInterface.dropTable('run_lots');
  await queryInterface.dropTable('run_pieces');
  await queryInterface.dropTable('run_sequences');
  await queryInterface.dropTable('runs');
}
