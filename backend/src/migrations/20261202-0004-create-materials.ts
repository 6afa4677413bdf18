import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

// Kept inside this file on purpose: a shipped migration must not change when shared code does.
const recordColumns = () => ({
  // Optimistic concurrency: every save names the version it read and bumps it.
  version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
  // Materials are never deleted (lots and runs point at them); archiving hides them from pickers.
  archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
});

const optionalNumber = { type: DataTypes.DOUBLE, allowNull: true };

export async function up({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.createTable('inks', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    manufacturer: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    function: { type: DataTypes.ENUM('conductor', 'dielectric', 'graphic'), allowNull: false },
    viscosity_milli_pa_s: { type: DataTypes.DOUBLE, allowNull: false },
    surface_tension_milli_n_per_m: { type: DataTypes.DOUBLE, allowNull: false },
    surface_tension_dispersive_milli_n_per_m: optionalNumber,
    surface_tension_polar_milli_n_per_m: optionalNumber,
    density_kg_per_m3: { type: DataTypes.DOUBLE, allowNull: false },
    solids_wt_percent: { type: DataTypes.DOUBLE, allowNull: false },
    solids_density_kg_per_m3: optionalNumber,
    sheet_resistance_ohm_per_sq: optionalNumber,
    tcr_per_k: optionalNumber,
    cure_reference_temp_c: optionalNumber,
    cure_reference_minutes: optionalNumber,
    activation_energy_kj_per_mol: optionalNumber,
    min_effective_cure_temp_c: optionalNumber,
    pot_life_hours: optionalNumber,
    storage_notes: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    // Solvents with their GHS codes travel with the ink; they are never queried on their own.
    solvents: { type: DataTypes.JSON, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    ...recordColumns(),
  });
  await queryInterface.addIndex('inks', ['archived', 'name']);

  await queryInterface.createTable('substrates', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    manufacturer: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
    // A string, not an ENUM: the class list will grow and the shared zod schema is the gate.
    substrate_class: { type: DataTypes.STRING(40), allowNull: false },
    thickness_um: { type: DataTypes.DOUBLE, allowNull: false },
    surface_energy_dispersive_milli_n_per_m: optionalNumber,
    surface_energy_polar_milli_n_per_m: optionalNumber,
    water_contact_angle_deg: optionalNumber,
    diiodomethane_contact_angle_deg: optionalNumber,
    max_continuous_temp_c: { type: DataTypes.DOUBLE, allowNull: false },
    max_short_exposure_temp_c: { type: DataTypes.DOUBLE, allowNull: false },
    max_short_exposure_seconds: { type: DataTypes.DOUBLE, allowNull: false },
    max_strain_percent: optionalNumber,
    is_transfer_carrier: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    ...recordColumns(),
  });
  await queryInterface.addIndex('substrates', ['archived', 'name']);

  // A lot belongs to an ink or a substrate (material_type + material_id); the service checks the
  // material exists, since one column cannot carry a foreign key to two tables.
  await queryInterface.createTable('material_lots', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    material_type: { type: DataTypes.ENUM('ink', 'substrate'), allowNull: false },
    material_id: { type: DataTypes.INTEGER, allowNull: false },
    lot_number: { type: DataTypes.STRING(60), allowNull: false },
    received_on: { type: DataTypes.DATEONLY, allowNull: false },
    opened_on: { type: DataTypes.DATEONLY, allowNull: true },
    expires_on: { type: DataTypes.DATEONLY, allowNull: true },
    notes: { type: DataTypes.STRING(1000), allowNull: false, defaultValue: '' },
    ...recordColumns(),
  });
  await queryInterface.addIndex('material_lots', ['archived', 'lot_number']);
  await queryInterface.addIndex('material_lots', ['material_type', 'material_id']);
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.dropTable('material_lots');
  await queryInterface.dropTable('substrates');
  await queryInterface.dropTable('inks');
}
