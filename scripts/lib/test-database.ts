import { randomBytes } from 'node:crypto';
import { rmSync } from 'node:fs';
import { join, resolve } from 'node:path';

import { freePort } from './free-port';
import { provisionDatabase, startMariadb, type MariadbInstance } from './mariadb';

export interface ThrowawayDatabase {
  env: Record<string, string>;
  instance: MariadbInstance;
  /** Another empty database on the same instance, same accounts; returns the env naming it. */
  addDatabase(name: string): Record<string, string>;
  stop(): Promise<void>;
}

const ROOT = resolve(import.meta.dirname, '..', '..');

/** A private MariaDB in its own folder and port, for tests only; removed when stopped. */
export async function startThrowawayDatabase(label = 'test'): Promise<ThrowawayDatabase> {
  const baseDir = join(ROOT, '.data', `${label}-db-${process.pid}-${randomBytes(3).toString('hex')}`);
  const port = await freePort();
  const instance = await startMariadb({ baseDir, port });
  const secret = () => randomBytes(18).toString('base64url');
  const accounts = {
    database: 'tracewright_test',
    owner: { user: 'tw_owner', password: secret() },
    app: { user: 'tw_app', password: secret() },
  };
  provisionDatabase(instance, accounts);
  const env = {
      DB_HOST: '127.0.0.1',
      DB_PORT: String(port),
      DB_NAME: accounts.database,
      DB_USER: accounts.app.user,
      DB_PASSWORD: accounts.app.password,
      DB_OWNER_USER: accounts.owner.user,
      DB_OWNER_PASSWORD: accounts.owner.password,
      DB_SOCKET: instance.socket,
  };
  return {
    instance,
    env,
    addDatabase(name) {
      provisionDatabase(instance, { ...accounts, database: name });
      return { ...env, DB_NAME: name };
    },
    async stop() {
      await instance.stop();
      rmSync(baseDir, { recursive: true, force: true });
    },
  };
}
