import { closeAppContext, createAppContext, migrateDatabase } from '../../backend/src/bootstrap';
import { loadEnv } from '../../backend/src/config/env';
import { createLogger } from '../../backend/src/lib/logger';
import { seedDemoLab } from '../../backend/src/seed/seed-demo-lab';

/** Migrates the schema (as owner) and seeds the demo lab into an empty database. */
export async function migrateAndSeed(env: Record<string, string>): Promise<{ migrations: string[]; seeded: boolean }> {
  const settings = loadEnv({ ...process.env, ...env });
  const migrations = await migrateDatabase(settings);
  const ctx = createAppContext(settings, createLogger('warn'));
  try {
    const { seeded } = await seedDemoLab(ctx);
    return { migrations, seeded };
  } finally {
    await closeAppContext(ctx);
  }
}
