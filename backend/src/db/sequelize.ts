import * as mariadb from 'mariadb';
import { Sequelize } from 'sequelize';

import type { Env } from '../config/env';
import { coalescingSocket } from './coalescing-socket';

/**
 * One Sequelize per role: `app` (data rights only) serves requests, `owner` runs migrations.
 * Times are stored and read in UTC.
 */
export function createSequelize(env: Env, as: 'app' | 'owner' = 'app'): Sequelize {
  const user = as === 'owner' ? env.DB_OWNER_USER : env.DB_USER;
  const password = as === 'owner' ? (env.DB_OWNER_PASSWORD ?? '') : env.DB_PASSWORD;
  return new Sequelize(env.DB_NAME, user, password, {
    host: env.DB_HOST,
    port: env.DB_PORT,
    dialect: 'mariadb',
    dialectModule: mariadb,
    logging: false,
    timezone: '+00:00',
    // Short waits so a request meets a dead or restarting database with a quick 503 (never a hang):
    // a connection normally takes milliseconds, and a wait for a free one is short unless overloaded.
    pool: { max: as === 'owner' ? 2 : env.DB_POOL_MAX, min: 0, acquire: 5_000, idle: 10_000 },
    // Queries issued together leave together (see coalescing-socket).
    dialectOptions: { connectTimeout: 3_000, stream: () => coalescingSocket(env.DB_PORT, env.DB_HOST) },
    define: { underscored: true },
  });
}
