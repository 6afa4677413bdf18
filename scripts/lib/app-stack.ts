import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';

import { startS3Fake, type S3Fake } from '../../backend/src/dev/s3-fake';
import { startSmtpFake, type SmtpFake } from '../../backend/src/dev/smtp-fake';
import { BIN, ROOT } from './paths';

export interface LocalFakes {
  smtp: SmtpFake;
  s3: S3Fake;
  mailDir: string;
  close(): Promise<void>;
}

/** The SMTP and S3 fakes on loopback, with their files under `baseDir`. */
export async function startFakes(baseDir: string, ports: { smtp?: number; s3?: number } = {}): Promise<LocalFakes> {
  const mailDir = join(baseDir, 'mail');
  const s3Dir = join(baseDir, 's3');
  mkdirSync(s3Dir, { recursive: true });
  const smtp = await startSmtpFake({ port: ports.smtp, captureDir: mailDir });
  const s3 = await startS3Fake({ directory: s3Dir, port: ports.s3 });
  return {
    smtp,
    s3,
    mailDir,
    async close() {
      await Promise.allSettled([smtp.close(), s3.close()]);
    },
  };
}

export function buildFrontend(): void {
  const result = spawnSync(BIN('vite'), ['build', '--logLevel', 'warn'], { cwd: join(ROOT, 'frontend'), stdio: 'inherit' });
  if (result.status !== 0) throw new Error('The frontend build failed (see above).');
}

/** Runs the backend in its own process with the given settings. */
export function spawnServer(env: Record<string, string>, options: { quiet?: boolean } = {}): ChildProcess {
  return spawn(BIN('tsx'), [join(ROOT, 'backend', 'src', 'server.ts')], {
    cwd: ROOT,
    env: { AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true', ...process.env, ...env },
    stdio: options.quiet ? ['ignore', 'ignore', 'inherit'] : 'inherit',
  });
}

export async function waitForHealth(url: string, server: ChildProcess, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`The server stopped during start (exit ${server.exitCode}).`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      /* not up yet */
    }
    await sleep(200);
  }
  throw new Error(`The server did not answer at ${url} within ${timeoutMs / 1000} s.`);
}

export function stopChild(child: ChildProcess | undefined): Promise<void> {
  if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const force = setTimeout(() => child.kill('SIGKILL'), 8_000);
    child.once('exit', () => {
      clearTimeout(force);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
