import { createHash, randomBytes } from 'node:crypto';

/** 32 random bytes, URL-safe; only the SHA-256 is stored. */
export function newOneTimeSecret(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: sha256Hex(token) };
}

export const sha256Hex = (value: string | Buffer) => createHash('sha256').update(value).digest('hex');
