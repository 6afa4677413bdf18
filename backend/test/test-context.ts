import { randomBytes } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import type { Express } from 'express';
import { inject } from 'vitest';

import type { AppContext, Clock } from '../src/app-context';
import { createApp } from '../src/app';
import { closeAppContext, createAppContext } from '../src/bootstrap';
import { loadEnv, type Env } from '../src/config/env';
import { startSmtpFake, type SmtpFake } from '../src/dev/smtp-fake';
import { createLogger } from '../src/lib/logger';

export interface TestContext {
  ctx: AppContext;
  app: Express;
  smtp: SmtpFake;
  env: Env;
  close(): Promise<void>;
}

/** A settable clock for tests that need time to pass without sleeping. */
export class TestClock implements Clock {
  private current = new Date();
  now = () => new Date(this.current);
  advance(ms: number) {
    this.current = new Date(this.current.getTime() + ms);
  }
}

/** The app wired to the migrated test database, a private SMTP fake and a quiet logger. */
export async function createTestContext(overrides: Record<string, string> = {}): Promise<TestContext> {
  const mailDir = mkdtempSync(join(tmpdir(), 'tw-mail-'));
  const smtp = await startSmtpFake({ captureDir: mailDir });
  const env = loadEnv({
    ...inject('dbEnv'),
    NODE_ENV: 'test',
    JWT_SECRET: randomBytes(32).toString('hex'),
    SMTP_PORT: String(smtp.port),
    MAIL_CAPTURE_DIR: mailDir,
    PUBLIC_URL: 'http://tablet.lab.example:8080',
    LOG_LEVEL: 'silent',
    DB_POOL_MAX: '5',
    ...overrides,
  });
  const ctx = createAppContext(env, createLogger('silent'));
  const app = createApp(ctx);
  return {
    ctx,
    app,
    smtp,
    env,
    async close() {
      await closeAppContext(ctx);
      await smtp.close();
    },
  };
}

export const uniqueEmail = (label = 'person') => `${label}-${randomBytes(5).toString('hex')}@lab.example`;
