import { generateKeyPairSync } from 'node:crypto';

import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { signDevice, signSession } from '../../src/lib/session-token';
import type { UserModel } from '../../src/models/user.model';
import { createUser } from '../fixtures';
import { createTestContext, type TestContext } from '../test-context';

// Forgeries the session tests in auth.routes.test.ts do not already cover (none, HS512, another
// secret, issuer, audience, expiry, token version): each must end in 401 on an admin-only route.

let t: TestContext;
let admin: UserModel;
beforeAll(async () => {
  t = await createTestContext();
  admin = await createUser('admin');
});
afterAll(() => t.close());

const base64url = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');
const claims = () => ({ sub: String(admin.id), tv: admin.tokenVersion, csrf: 'x', iss: 'tracewright', aud: 'tracewright-session', exp: Math.floor(Date.now() / 1000) + 3600 });
const asCookie = (token: string) => request(t.app).get('/api/users').set('Cookie', `tw_session=${token}`);
const valid = () => signSession(t.env.JWT_SECRET, { sub: String(admin.id), tv: admin.tokenVersion, csrf: 'x' }, 1);

describe('forged session tokens', () => {
  it('when a genuine token is sent, then the admin route answers (so the refusals below mean something)', async () => {
    expect((await asCookie(valid())).status).toBe(200);
  });

  it.each([
    ['alg "None" in mixed case, unsigned', () => `${base64url({ alg: 'None', typ: 'JWT' })}.${base64url(claims())}.`],
    ['alg "NONE", unsigned', () => `${base64url({ alg: 'NONE', typ: 'JWT' })}.${base64url(claims())}.`],
    ['HS256 in the header but the signature stripped', () => `${valid().split('.').slice(0, 2).join('.')}.`],
    ['RS256 signed with a key pair of the attacker', () => {
      const { privateKey } = generateKeyPairSync('rsa', { modulusLength: 2048 });
      return jwt.sign(claims(), privateKey, { algorithm: 'RS256' });
    }],
    ['a genuine signature over changed claims', () => {
      const [header, , signature] = valid().split('.');
      return `${header}.${base64url({ ...claims(), sub: String(admin.id), tv: admin.tokenVersion + 5 })}.${signature}`;
    }],
    ['no expiry at all', () => jwt.sign({ tv: admin.tokenVersion, csrf: 'x' }, t.env.JWT_SECRET, { algorithm: 'HS256', issuer: 'tracewright', audience: 'tracewright-session', subject: String(admin.id) })],
    ['a subject that is not a person id', () => jwt.sign({ tv: admin.tokenVersion, csrf: 'x' }, t.env.JWT_SECRET, { algorithm: 'HS256', issuer: 'tracewright', audience: 'tracewright-session', subject: '1 OR 1=1', expiresIn: 60 })],
    ['the trusted-device mark in place of a session', () => signDevice(t.env.JWT_SECRET)],
    ['garbage of the right shape', () => 'aaaa.bbbb.cccc'],
  ])('when the session cookie carries %s, then 401', async (_label, forge) => {
    const res = await asCookie(forge());
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  });

  it('when a genuine token comes in an Authorization header instead of the cookie, then it is ignored: 401', async () => {
    const res = await request(t.app).get('/api/users').set('Authorization', `Bearer ${valid()}`);
    expect(res.status).toBe(401);
  });

  it('when a session token is offered as the trusted-device mark, then PIN switching stays closed', async () => {
    const res = await request(t.app).get('/api/auth/pin-users').set('Cookie', `tw_device=${valid()}`);
    expect(res.status).toBe(401);
  });
});
