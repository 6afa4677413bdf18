import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * Trend curation. Point notes exclude a reading from a trend's limits (or take it back, or only
 * annotate it), always with a reason; baselines freeze a trend's limits from chosen runs. Both are
 * kept as history (append-only): the newest note per reading and the newest baseline per recipe
 * and spec are in force, and the older ones show how the chart came to be.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  const ref = (model: string) => ({ type: DataTypes.INTEGER, allowNull: false, references: { model, key: 'id' }, onDelete: 'RESTRICT' });
  await queryInterface.createTable('trend_point_notes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    reading_id: ref('run_readings'),
    excluded: { type: DataTypes.BOOLEAN, allowNull: false },
    reason: { type: DataTypes.STRING(1000), allowNull: false },
    by_id: ref('users'),
    at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('trend_point_notes', ['reading_id', 'id']);

  await queryInterface.createTable('trend_baselines', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    recipe_id: ref('recipes'),
    spec_id: { type: DataTypes.STRING(40), allowNull: false },
    run_ids: { type: DataTypes.JSON, allowNull: false },
    mean: { type: DataTypes.DOUBLE, allowNull: false },
    sigma: { type: DataTypes.DOUBLE, allowNull: false },
    reason: { type: DataTypes.STRING(1000), allowNull: false },
    by_id: ref('users'),
    at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('trend_baselines', ['recipe_id', 'spec_id', 'id']);

  for (const table of ['trend_point_notes', 'trend_baselines']) {
    await sequelize.query(`CREATE TRIGGER ${table}_no_update BEFORE UPDATE ON ${table} FOR EACH ROW
      SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${table} is append-only'`);
    await sequelize.query(`CREATE TRIGGER ${table}_no_delete BEFORE DELETE ON ${table} FOR EACH ROW
      SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${table} is append-only'`);
  }
  // The audit search filters by day range; ids already give the newest-first order.
  await queryInterface.addIndex('audit_events', ['at']);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await queryInterface.removeIndex('audit_events', ['at']);
  for (const table of ['trend_point_notes', 'trend_baselines']) {
    await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_no_update`);
    await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_no_delete`);
  }
  await queryInterface.dropTable('trend_baselines');
  await queryInterface.dropTable('trend_point_notes');
}
