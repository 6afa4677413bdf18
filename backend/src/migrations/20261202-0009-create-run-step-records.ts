import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * What happens at each step of a run: the step record (one per step, made when the run is
 * planned), timers, lot confirmations, nozzle checks and cure logs. Every tablet write keeps the
 * tablet's own clock (device_time) and whether it was made offline, beside the time we trust.
 */
export async function up({ context: { queryInterface } }: { context: MigrationContext }) {
  const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER, allowNull, references: { model, key: 'id' }, onDelete: 'RESTRICT' });
  const at = (allowNull = true) => ({ type: DataTypes.DATE(3), allowNull });
  const stepId = { type: DataTypes.STRING(40), allowNull: false };
  const device = () => ({
    device_time: at(),
    made_offline: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
  });

  await queryInterface.createTable('run_step_records', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    step_id: stepId,
    state: { type: DataTypes.STRING(20), allowNull: false },
    safety_acknowledged_by: ref('users', true),
    safety_acknowledged_at: at(),
    started_by: ref('users', true),
    started_at: at(),
    // Who settled the step and when: done, or closed as not done (then with its reason).
    completed_by: ref('users', true),
    completed_at: at(),
    not_done_reason: { type: DataTypes.STRING(1000), allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: false },
    // True once any write for this step carried only the tablet's clock.
    has_device_time: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    created_at: at(false),
    updated_at: at(false),
  });
  // The backstop for "exactly one completion": a step has one record, which the service locks.
  await queryInterface.addIndex('run_step_records', ['run_id', 'step_id'], { unique: true });

  await queryInterface.createTable('run_timers', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    step_id: stepId,
    label: { type: DataTypes.STRING(80), allowNull: false },
    planned_seconds: { type: DataTypes.DOUBLE, allowNull: false },
    started_at: at(false),
    started_on_device_clock: { type: DataTypes.BOOLEAN, allowNull: false },
    started_by: ref('users'),
    stopped_at: at(),
    stopped_on_device_clock: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    stopped_by: ref('users', true),
    stop_reason: { type: DataTypes.STRING(1000), allowNull: true },
    created_at: at(false),
  });
  await queryInterface.addIndex('run_timers', ['run_id', 'step_id']);

  await queryInterface.createTable('run_lot_confirmations', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    step_id: stepId,
    lot_id: ref('material_lots'),
    confirmed_by: ref('users'),
    confirmed_at: at(false),
    ...device(),
  });
  await queryInterface.addIndex('run_lot_confirmations', ['run_id', 'step_id', 'lot_id'], { unique: true });

  await queryInterface.createTable('run_nozzle_checks', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    step_id: stepId,
    passed: { type: DataTypes.BOOLEAN, allowNull: false },
    photo_file_id: ref('stored_files', true),
    checked_by: ref('users'),
    checked_at: at(false),
    ...device(),
  });
  await queryInterface.addIndex('run_nozzle_checks', ['run_id', 'step_id']);

  await queryInterface.createTable('run_cure_logs', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    run_id: ref('runs'),
    step_id: stepId,
    // The logged (minute, °C) points as typed, and the dose judged for each ink the cure is for.
    samples: { type: DataTypes.JSON, allowNull: false },
    dose: { type: DataTypes.JSON, allowNull: false },
    recorded_by: ref('users'),
    recorded_at: at(false),
    ...device(),
  });
  await queryInterface.addIndex('run_cure_logs', ['run_id', 'step_id']);
}

export async function down({ context: { queryInterface } }: { context: MigrationContext }) {
  await queryInterface.dropTable('run_cure_logs');
  await queryInterface.dropTable('run_nozzle_checks');
  await queryInterface.dropTable('run_lot_confirmations');
  await queryInterface.dropTable('run_timers');
  await queryInterface.dropTable('run_step_records');
}
