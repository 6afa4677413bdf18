import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

import { DATA_DIR } from './paths';

export interface LocalSecrets {
  dbOwnerPassword: string;
  dbAppPassword: string;
  jwtSecret: string;
}

/** Secrets generated on first start into .data/ (ignored by git), readable only by the owner. */
export function loadOrCreateSecrets(): LocalSecrets {
  const file = join(DATA_DIR, 'secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8')) as LocalSecrets;
  mkdirSync(DATA_DIR, { recursive: true });
  const secrets: LocalSecrets = {
    dbOwnerPassword: randomBytes(18).toString('base64url'),
    dbAppPassword: randomBytes(18).toString('base64url'),
    jwtSecret: randomBytes(48).toString('base64url'),
  };
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}
