import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

import { MIGRATIONS } from '../migrations/index';

export type MigrationContext = { queryInterface: QueryInterface; sequelize: Sequelize };

/** Umzug over the listed migrations; run with the owner account (the app account has no DDL rights). */
export function createMigrator(sequelize: Sequelize) {
  const context: MigrationContext = { queryInterface: sequelize.getQueryInterface(), sequelize };
  return new Umzug<MigrationContext>({
    migrations: MIGRATIONS.map((m) => ({
      name: m.name,
      up: () => m.up({ context }),
      down: () => m.down({ context }),
    })),
    context,
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrateToLatest(sequelize: Sequelize): Promise<string[]> {
  const done = await createMigrator(sequelize).up();
  return done.map((m) => m.name);
}
