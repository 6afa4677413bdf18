import { createSecretKey, randomBytes, type KeyObject } from 'node:crypto';

import jwt from 'jsonwebtoken';

/** RFC 8725: pin the algorithm, check issuer, audience and expiry on every verification. */
const ALGORITHM = 'HS256' as const;
const ISSUER = 'tracewright';
const SESSION_AUDIENCE = 'tracewright-session';
const DEVICE_AUDIENCE = 'tracewright-device';

export interface SessionClaims {
  sub: string;
  tv: number;
  csrf: string;
}

const keys = new Map<string, KeyObject>();
/**
 * The HMAC key as a KeyObject, made once per secret: given a plain string, jsonwebtoken first
 * tries to read it as a public key on every call, a failed parse that cost more than the HMAC.
 */
function keyOf(secret: string): KeyObject {
  let key = keys.get(secret);
  if (!key) {
    key = createSecretKey(Buffer.from(secret, 'utf8'));
    keys.set(secret, key);
  }
  return key;
}

export const newCsrfToken = () => randomBytes(24).toString('base64url');

export function signSession(secret: string, claims: SessionClaims, hours: number): string {
  return jwt.sign({ tv: claims.tv, csrf: claims.csrf }, keyOf(secret), {
    algorithm: ALGORITHM,
    issuer: ISSUER,
    audience: SESSION_AUDIENCE,
    subject: claims.sub,
    expiresIn: Math.round(hours * 3600),
  });
}

export function verifySession(secret: string, token: string): SessionClaims | null {
  try {
    const payload = jwt.verify(token, keyOf(secret), { algorithms: [ALGORITHM], issuer: ISSUER, audience: SESSION_AUDIENCE });
    if (typeof payload === 'string' || typeof payload.sub !== 'string') return null;
    if (typeof payload.tv !== 'number' || typeof payload.csrf !== 'string') return null;
    // jsonwebtoken accepts a token without exp; ours always carry one, so one without never lived here.
    if (typeof payload.exp !== 'number') return null;
    // The subject is a person id; anything else would reach the user lookup as NaN.
    if (!/^[1-9][0-9]{0,9}$/.test(payload.sub)) return null;
    return { sub: payload.sub, tv: payload.tv, csrf: payload.csrf };
  } catch {
    return null;
  }
}

/** A trusted-device mark: set at a password sign-in, it lets the tablet offer PIN switching. */
export function signDevice(secret: string, days = 180): string {
  return jwt.sign({ did: randomBytes(12).toString('base64url') }, keyOf(secret), {
    algorithm: ALGORITHM,
    issuer: ISSUER,
    audience: DEVICE_AUDIENCE,
    expiresIn: days * 86_400,
  });
}

export function verifyDevice(secret: string, token: string | undefined): boolean {
  if (!token) return false;
  try {
    jwt.verify(token, keyOf(secret), { algorithms: [ALGORITHM], issuer: ISSUER, audience: DEVICE_AUDIENCE });
    return true;
  } catch {
    return false;
  }
}
