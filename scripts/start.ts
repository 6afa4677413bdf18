/**
 * `npm start`: the whole product on one machine. Installs MariaDB from Debian's packages when
 * missing, starts a private instance, the local mail and file fakes, migrates, seeds the demo lab,
 * builds the frontend and serves it. Ctrl-C stops everything cleanly.
 */
import { spawn } from 'node:child_process';
import { join } from 'node:path';

import { DEMO_PASSWORD, DEMO_PEOPLE } from '../backend/src/seed/demo-people';
import { buildFrontend, spawnServer, startFakes, stopChild, waitForHealth } from './lib/app-stack';
import { provisionDatabase, startMariadb } from './lib/mariadb';
import { BIN, DATA_DIR, FRONTEND_DIST, ROOT } from './lib/paths';
import { migrateAndSeed } from './lib/prepare-database';
import { loadOrCreateSecrets } from './lib/secrets';

const num = (value: string | undefined, fallback: number) => (value ? Number(value) : fallback);

async function main() {
  const dev = process.argv.includes('--dev');
  const skipBuild = dev || process.argv.includes('--skip-build');
  const port = num(process.env.PORT, 8080);
  const dbPort = num(process.env.DB_PORT, 3307);
  const secrets = loadOrCreateSecrets();

  console.log(`[start] MariaDB on 127.0.0.1:${dbPort} (data in .data/mariadb)…`);
  const db = await startMariadb({ baseDir: join(DATA_DIR, 'mariadb'), port: dbPort });
  const stopAll: Array<() => Promise<void>> = [() => db.stop()];
  const shutdown = async (code: number) => {
    for (const stop of stopAll.reverse()) await stop().catch(() => undefined);
    process.exit(code);
  };
  process.on('SIGINT', () => void shutdown(0));
  process.on('SIGTERM', () => void shutdown(0));

  try {
    provisionDatabase(db, {
      database: 'tracewright',
      owner: { user: 'tw_owner', password: secrets.dbOwnerPassword },
      app: { user: 'tw_app', password: secrets.dbAppPassword },
    });
    const fakes = await startFakes(DATA_DIR, { smtp: num(process.env.SMTP_PORT, 2525), s3: num(process.env.S3_PORT, 4569) });
    stopAll.push(() => fakes.close());

    const env: Record<string, string> = {
      NODE_ENV: dev ? 'development' : 'production',
      PORT: String(port),
      DB_PORT: String(dbPort),
      DB_NAME: 'tracewright',
      DB_PASSWORD: secrets.dbAppPassword,
      DB_OWNER_PASSWORD: secrets.dbOwnerPassword,
      JWT_SECRET: process.env.JWT_SECRET ?? secrets.jwtSecret,
      SMTP_PORT: String(fakes.smtp.port),
      MAIL_CAPTURE_DIR: fakes.mailDir,
      S3_ENDPOINT: fakes.s3.endpoint,
      STATIC_DIR: FRONTEND_DIST,
    };
    const { seeded } = await migrateAndSeed(env);
    if (!skipBuild) {
      console.log('[start] Building the app…');
      buildFrontend();
    }
    const server = spawnServer(env);
    stopAll.push(() => stopChild(server));
    server.once('exit', (code) => {
      console.error(`[start] The server stopped (exit ${code}).`);
      void shutdown(code ?? 1);
    });
    await waitForHealth(`http://127.0.0.1:${port}`, server);
    if (dev) {
      // Vite serves the frontend with hot reload and proxies /api to the server above.
      const vite = spawn(BIN('vite'), ['--port', '5173', '--strictPort'], { cwd: join(ROOT, 'frontend'), stdio: 'inherit' });
      stopAll.push(() => stopChild(vite));
    }
    printWelcome(dev ? 'http://localhost:5173' : (process.env.PUBLIC_URL ?? `http://localhost:${port}`), seeded);
  } catch (error) {
    console.error(`[start] ${error instanceof Error ? error.message : String(error)}`);
    await shutdown(1);
  }
}

function printWelcome(url: string, seeded: boolean) {
  const width = Math.max(...DEMO_PEOPLE.map((p) => p.email.length));
  console.log(`\nTracewright is running at ${url}\n`);
  console.log(`Demo sign-ins${seeded ? ' (demo lab seeded just now)' : ''} — password for all: ${DEMO_PASSWORD}`);
  for (const person of DEMO_PEOPLE) {
    console.log(`  ${person.email.padEnd(width)}  ${person.role.padEnd(9)} ${person.name}${person.pin ? `  (PIN ${person.pin})` : ''}`);
  }
  console.log('\nMail is caught locally: sign in as the admin and open "Outgoing mail". Stop with Ctrl-C.\n');
}

void main();
