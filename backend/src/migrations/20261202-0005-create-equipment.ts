import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

// Kept inside this file on purpose: a shipped migration must not change when shared code does.
const recordColumns = () => ({
  // Optimistic concurrency: every save names the version it read and bumps it.
  version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
  // Equipment is never deleted (runs record what was used); archiving hides it from pickers.
  archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
});

export async function up({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.createTable('printers', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    model: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    nozzle_diameter_um: { type: DataTypes.DOUBLE, allowNull: false },
    drop_volume_pl: { type: DataTypes.DOUBLE, allowNull: false },
    jetting_speed_metres_per_second: { type: DataTypes.DOUBLE, allowNull: false },
    native_dpi: { type: DataTypes.DOUBLE, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    ...recordColumns(),
  });
  await queryInterface.addIndex('printers', ['archived', 'name']);

  // Channels are rows, not JSON, so the database itself refuses a channel loaded with an ink
  // that does not exist (inks are archived, never deleted, hence RESTRICT).
  await queryInterface.createTable('printer_channels', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    printer_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'printers', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false },
    name: { type: DataTypes.STRING(30), allowNull: false },
    ink_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'inks', key: 'id' }, onDelete: 'RESTRICT' },
  });
  await queryInterface.addIndex('printer_channels', ['printer_id', 'position'], { unique: true });

  // Kinds and methods are strings, not ENUMs: their lists will grow, and the shared zod schema
  // is the gate, so adding one needs no ALTER TABLE.
  const equipmentTables = {
    heat_sources: {
      kind: { type: DataTypes.STRING(30), allowNull: false },
      max_temp_c: { type: DataTypes.DOUBLE, allowNull: false },
    },
    surface_treaters: { method: { type: DataTypes.STRING(30), allowNull: false } },
    instruments: {
      kind: { type: DataTypes.STRING(40), allowNull: false },
      serial_number: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
    },
  };
  for (const [table, specific] of Object.entries(equipmentTables)) {
    await queryInterface.createTable(table, {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      ...specific,
      calibration_due_on: { type: DataTypes.DATEONLY, allowNull: true },
      notes: { type: DataTypes.TEXT, allowNull: false },
      ...recordColumns(),
    });
    await queryInterface.addIndex(table, ['archived', 'name']);
    // "What is due for calibration" is the next question these tables will be asked.
    await queryInterface.addIndex(table, ['calibration_due_on']);
  }
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }) {
  for (const table of ['instruments', 'surface_treaters', 'heat_sources', 'printer_channels', 'printers']) {
    await queryInterface.dropTable(table);
  }
}
