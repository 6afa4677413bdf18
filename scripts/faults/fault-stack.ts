import { spawn, type ChildProcess } from 'node:child_process';
import { closeSync, copyFileSync, existsSync, mkdirSync, openSync, readFileSync, rmSync } from 'node:fs';
import { dirname, join } from 'node:path';

import { startFakes, stopChild, waitForHealth, type LocalFakes } from '../lib/app-stack';
import { freePort } from '../lib/free-port';
import { BIN, DATA_DIR, ROOT } from '../lib/paths';
import { migrateAndSeed } from '../lib/prepare-database';
import { startThrowawayDatabase, type ThrowawayDatabase } from '../lib/test-database';

/** The server in its own process, its database in another: the database can die while the server lives on. */
export interface FaultStack {
  db: ThrowawayDatabase;
  baseUrl: string;
  server: ChildProcess;
  /** The server's own log (stdout and stderr), shown when a round fails. */
  logFile: string;
  /** The log's error lines (pino level 50 and up): each 500 logs one with its stack. */
  logErrors(limit?: number): string;
  /** Stops everything; with `keepLogAs`, the server's log is copied there first. */
  close(keepLogAs?: string): Promise<void>;
}

/** A throwaway MariaDB seeded with the demo lab, the mail and file fakes, and the real server. */
export async function startFaultStack(): Promise<FaultStack> {
  const db = await startThrowawayDatabase('faults');
  const stackDir = join(DATA_DIR, `faults-stack-${process.pid}`);
  mkdirSync(stackDir, { recursive: true });
  let fakes: LocalFakes | undefined;
  let server: ChildProcess | undefined;
  try {
    fakes = await startFakes(stackDir);
    const port = await freePort();
    const baseUrl = `http://127.0.0.1:${port}`;
    const env: Record<string, string> = {
      ...db.env,
      NODE_ENV: 'test',
      PORT: String(port),
      PUBLIC_URL: baseUrl,
      JWT_SECRET: 'faults-'.padEnd(48, 'x'),
      SMTP_PORT: String(fakes.smtp.port),
      MAIL_CAPTURE_DIR: fakes.mailDir,
      S3_ENDPOINT: fakes.s3.endpoint,
      LOG_LEVEL: 'warn',
    };
    await migrateAndSeed(env);
    const logFile = join(stackDir, 'server.log');
    server = spawnLoggedServer(env, logFile);
    await waitForHealth(baseUrl, server);
    const started = { server, fakes };
    return {
      db,
      baseUrl,
      server,
      logFile,
      logErrors: (limit = 5) => readErrors(logFile).slice(0, limit).join('\n'),
      async close(keepLogAs) {
        await stopChild(started.server);
        if (keepLogAs && existsSync(logFile)) {
          mkdirSync(dirname(keepLogAs), { recursive: true });
          copyFileSync(logFile, keepLogAs);
        }
        await started.fakes.close();
        await db.stop();
        rmSync(stackDir, { recursive: true, force: true });
      },
    };
  } catch (error) {
    await stopChild(server);
    await fakes?.close();
    await db.stop();
    rmSync(stackDir, { recursive: true, force: true });
    throw error;
  }
}

/**
 * Like app-stack's spawnServer, but the log goes to a file: hundreds of "database unavailable"
 * warnings per outage would drown the test output, yet a failed round needs them.
 */
function spawnLoggedServer(env: Record<string, string>, logFile: string): ChildProcess {
  const fd = openSync(logFile, 'a');
  const child = spawn(BIN('tsx'), [join(ROOT, 'backend', 'src', 'server.ts')], {
    cwd: ROOT,
    env: { AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true', ...process.env, ...env },
    stdio: ['ignore', fd, fd],
  });
  closeSync(fd);
  return child;
}

function readErrors(logFile: string): string[] {
  if (!existsSync(logFile)) return [];
  return readFileSync(logFile, 'utf8')
    .split('\n')
    .filter((line) => /"level":(50|60)/.test(line) || /^\S*Error/.test(line));
}
