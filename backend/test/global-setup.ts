import type { TestProject } from 'vitest/node';

import { startThrowawayDatabase, type ThrowawayDatabase } from '../../scripts/lib/test-database';
import { migrateDatabase } from '../src/bootstrap';
import { loadEnv } from '../src/config/env';

declare module 'vitest' {
  export interface ProvidedContext {
    dbEnv: Record<string, string>;
  }
}

const DB_KEYS = ['DB_HOST', 'DB_PORT', 'DB_NAME', 'DB_USER', 'DB_PASSWORD', 'DB_OWNER_USER', 'DB_OWNER_PASSWORD', 'DB_SOCKET'];

/**
 * `npm test` passes its throwaway database in the environment; run alone (`npx vitest`), the
 * backend suite starts one of its own. Either way the schema is migrated once here.
 */
export default async function setup(project: TestProject) {
  let own: ThrowawayDatabase | undefined;
  let dbEnv: Record<string, string>;
  if (process.env.DB_PORT && process.env.DB_PASSWORD && process.env.DB_OWNER_PASSWORD) {
    dbEnv = Object.fromEntries(DB_KEYS.filter((k) => process.env[k]).map((k) => [k, process.env[k] as string]));
  } else {
    own = await startThrowawayDatabase('vitest');
    dbEnv = own.env;
  }
  await migrateDatabase(loadEnv({ ...dbEnv, JWT_SECRET: 'x'.repeat(32), NODE_ENV: 'test' }));
  project.provide('dbEnv', dbEnv);
  return async () => {
    await own?.stop();
  };
}
