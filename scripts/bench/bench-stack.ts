import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';

import express, { type Express } from 'express';

import { createApp } from '../../backend/src/app';
import type { AppContext } from '../../backend/src/app-context';
import { closeAppContext, createAppContext, migrateDatabase } from '../../backend/src/bootstrap';
import { loadEnv, type Env } from '../../backend/src/config/env';
import { createLogger } from '../../backend/src/lib/logger';
import { seedDemoLab } from '../../backend/src/seed/seed-demo-lab';
import { startThrowawayDatabase, type ThrowawayDatabase } from '../lib/test-database';

/** The running product under test: its own database (demo lab seeded), the app, and an outer app for bench-only routes. */
export interface BenchStack {
  db: ThrowawayDatabase;
  env: Env;
  ctx: AppContext;
  baseUrl: string;
  stop(): Promise<void>;
}

export interface SignedIn {
  cookie: string;
  csrf: string;
  userId: number;
}

/**
 * Starts a throwaway MariaDB, migrates it, seeds the demo lab and serves the app on loopback.
 * `staticDir` serves a built frontend (for the first-paint measure). Everything is stopped by `stop`.
 */
export async function startBenchStack(options: { staticDir?: string; benchRoutes?: (outer: Express, ctx: AppContext) => void } = {}): Promise<BenchStack> {
  // Node 20 is this project's fixed runtime; the storage SDK's notice about it is noise here.
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';
  const db = await startThrowawayDatabase('bench');
  let ctx: AppContext | undefined;
  let server: Server | undefined;
  const stop = async () => {
    if (server) await new Promise((done) => server?.close(done));
    if (ctx) await closeAppContext(ctx);
    await db.stop();
  };
  try {
    const env = loadEnv({
      ...db.env,
      NODE_ENV: 'production',
      JWT_SECRET: 'bench-'.padEnd(48, 'x'),
      LOG_LEVEL: 'silent',
      // Each write holds a connection for its transaction; 20 is the product default too.
      DB_POOL_MAX: '20',
      SIGN_IN_LIMIT: '100000',
      ...(options.staticDir ? { STATIC_DIR: options.staticDir } : {}),
    });
    await migrateDatabase(env);
    ctx = createAppContext(env, createLogger('silent'));
    await seedDemoLab(ctx);
    const outer = express();
    // The product app answers every path (404s, the single page), so bench routes go in front of it.
    options.benchRoutes?.(outer, ctx);
    outer.use(createApp(ctx));
    server = outer.listen(0, '127.0.0.1');
    await new Promise((resolve, reject) => server?.once('listening', resolve).once('error', reject));
    const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    return { db, env, ctx, baseUrl, stop };
  } catch (error) {
    await stop();
    throw error;
  }
}

/** Signs in through the API as a browser would; writes need the CSRF header besides the cookies. */
export async function signIn(baseUrl: string, email: string, password: string): Promise<SignedIn> {
  const res = await fetch(`${baseUrl}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (!res.ok) throw new Error(`Signing in as ${email} failed: ${res.status} ${await res.text()}`);
  const body = (await res.json()) as { csrfToken: string; user: { id: number } };
  const cookie = res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  return { cookie, csrf: body.csrfToken, userId: body.user.id };
}
