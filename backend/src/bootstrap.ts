import type { Logger } from 'pino';

import { systemClock, type AppContext } from './app-context';
import type { Env } from './config/env';
import { migrateToLatest } from './db/migrator';
import { createSequelize } from './db/sequelize';
import { createLogger } from './lib/logger';
import { initModels } from './models/index';
import { createFileStorage } from './services/file-storage.service';
import { createMailer } from './services/mail.service';

/** Connects everything a running server needs; the caller owns shutdown via `closeAppContext`. */
export function createAppContext(env: Env, logger: Logger = createLogger(env.LOG_LEVEL)): AppContext {
  const sequelize = createSequelize(env, 'app');
  initModels(sequelize);
  return { env, sequelize, logger, mailer: createMailer(env), storage: createFileStorage(env), clock: systemClock };
}

export async function closeAppContext(ctx: AppContext): Promise<void> {
  ctx.mailer.close();
  await ctx.sequelize.close();
}

/** Migrations run as the schema owner; the app account cannot change the schema. */
export async function migrateDatabase(env: Env): Promise<string[]> {
  const owner = createSequelize(env, 'owner');
  try {
    return await migrateToLatest(owner);
  } finally {
    await owner.close();
  }
}
