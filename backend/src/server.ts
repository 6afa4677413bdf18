import type { Server } from 'node:http';

import { createApp } from './app';
import { closeAppContext, createAppContext, migrateDatabase } from './bootstrap';
import { loadEnv } from './config/env';
import { startIdempotencyKeyPurge } from './services/idempotency-retention';

/** Starts the HTTP server: migrate, connect, listen; stops cleanly on SIGINT/SIGTERM. */
async function main() {
  const env = loadEnv();
  if (env.DB_OWNER_PASSWORD) await migrateDatabase(env);
  const ctx = createAppContext(env);
  await ctx.storage.ensureBucket().catch((error: Error) => ctx.logger.warn({ err: error.message }, 'file storage not reachable yet'));
  const app = createApp(ctx);
  const server: Server = app.listen(env.PORT, env.HOST, () => {
    ctx.logger.info({ url: env.PUBLIC_URL, host: env.HOST, port: env.PORT }, 'Tracewright is listening');
  });
  const stopPurge = startIdempotencyKeyPurge(ctx);
  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    ctx.logger.info({ signal }, 'stopping');
    stopPurge();
    server.close(() => {
      void closeAppContext(ctx).finally(() => process.exit(0));
    });
    setTimeout(() => process.exit(0), 5_000).unref();
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
  process.on('unhandledRejection', (reason) => ctx.logger.error({ err: reason }, 'unhandled rejection'));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
