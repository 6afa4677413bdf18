import type { MigrationContext } from '../db/migrator';

/**
 * The private MariaDB now indexes words from 2 letters (innodb_ft_min_token_size=2), so a search
 * for "Ag" or "Cu" can use the full-text index. An index built before that holds no 2-letter
 * words and would answer such searches with nothing: rebuild it under the server's setting.
 */
export async function up({ context: { sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP INDEX deviations_text ON deviations');
  await sequelize.query('CREATE FULLTEXT INDEX deviations_text ON deviations (title, expected, actual)');
}

export async function down() {
  // Nothing to undo: the rebuilt index has the same definition as before.
}
