import { DataTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * Recipes and their versions. A version's content is one JSON document (the shared
 * DraftContentSchema is its gate); content_hash is the SHA-256 of its canonical JSON, which a
 * signature names so it proves exactly what was approved.
 */
export async function up({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await queryInterface.createTable('recipes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    code: { type: DataTypes.STRING(30), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    product: { type: DataTypes.STRING(120), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    // Optimistic concurrency for the recipe's own fields (the content has lock_version).
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    created_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('recipes', ['archived', 'code']);

  const person = () => ({ type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' } });
  await queryInterface.createTable('recipe_versions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    // Versions are never deleted (runs and signatures point at them), hence RESTRICT.
    recipe_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'recipes', key: 'id' }, onDelete: 'RESTRICT' },
    number: { type: DataTypes.INTEGER, allowNull: false },
    // A string, not an ENUM: the shared VERSION_STATES list is the gate.
    state: { type: DataTypes.STRING(20), allowNull: false },
    content: { type: DataTypes.JSON, allowNull: false },
    lock_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    content_hash: { type: DataTypes.CHAR(64), allowNull: false },
    author_id: { ...person(), allowNull: false },
    submitted_by: person(),
    submitted_at: { type: DataTypes.DATE(3), allowNull: true },
    released_by: person(),
    released_at: { type: DataTypes.DATE(3), allowNull: true },
    retired_at: { type: DataTypes.DATE(3), allowNull: true },
    review_comment: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('recipe_versions', ['recipe_id', 'number'], { unique: true });
  // The review queue: "everything in review", oldest first.
  await queryInterface.addIndex('recipe_versions', ['state', 'submitted_at']);

  // The service locks the recipe row before changing versions; these keys are the backstop:
  // at most one open (draft or in-review) and one released version per recipe, even for raw SQL.
  await sequelize.query(`ALTER TABLE recipe_versions
    ADD COLUMN open_slot INT AS (IF(state IN ('draft', 'in-review'), recipe_id, NULL)) VIRTUAL,
    ADD COLUMN released_slot INT AS (IF(state = 'released', recipe_id, NULL)) VIRTUAL,
    ADD UNIQUE INDEX recipe_versions_one_open (open_slot),
    ADD UNIQUE INDEX recipe_versions_one_released (released_slot)`);

  // Released content is immutable: only the step to retired may touch a released row, and a
  // retired row never changes. Versions are never deleted.
  await sequelize.query(`CREATE TRIGGER recipe_versions_frozen BEFORE UPDATE ON recipe_versions FOR EACH ROW
    BEGIN
      IF OLD.state = 'retired' OR (OLD.state = 'released' AND (NEW.state <> 'retired' OR NEW.content_hash <> OLD.content_hash
          OR NEW.content <> OLD.content OR NOT (NEW.released_by <=> OLD.released_by) OR NOT (NEW.released_at <=> OLD.released_at))) THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'released recipe versions are read-only';
      END IF;
    END`);
  await sequelize.query(`CREATE TRIGGER recipe_versions_no_delete BEFORE DELETE ON recipe_versions FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'recipe versions are never deleted'`);
}

export async function down({ context: { queryInterface, sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS recipe_versions_frozen');
  await sequelize.query('DROP TRIGGER IF EXISTS recipe_versions_no_delete');
  await queryInterface.dropTable('recipe_versions');
  await queryInterface.dropTable('recipes');
}
