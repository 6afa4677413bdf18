import argon2 from 'argon2';

/**
 * argon2id at the OWASP Password Storage Cheat Sheet minimum (m = 19 MiB, t = 2, p = 1).
 * PINs use the same hash: they are short, so the rate limiter is what protects them.
 */
export const ARGON2_OPTIONS = { type: argon2.argon2id, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export const hashSecret = (secret: string) => argon2.hash(secret, ARGON2_OPTIONS);

export async function verifySecret(hash: string | null | undefined, secret: string): Promise<boolean> {
  if (!hash) {
    // Spend the same time as a real check so response timing does not reveal unknown accounts.
    await argon2.hash(secret, ARGON2_OPTIONS);
    return false;
  }
  try {
    return await argon2.verify(hash, secret);
  } catch {
    return false;
  }
}
