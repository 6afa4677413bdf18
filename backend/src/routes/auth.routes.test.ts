import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AuditEventModel } from '../models/audit-event.model';
import { UserModel } from '../models/user.model';
import { createUser, signInAs, TEST_PASSWORD } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext({ SIGN_IN_LIMIT: '4' });
});
afterAll(() => t.close());

const auditCount = () => AuditEventModel.count();

describe('sign-in', () => {
  it('when the password is right, then a session cookie is set and the sign-in is audited', async () => {
    const user = await createUser('engineer');
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: user.email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: user.id, role: 'engineer' });
    const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
    expect(cookies.find((c) => c.startsWith('tw_session='))).toMatch(/HttpOnly/);
    expect(cookies.find((c) => c.startsWith('tw_session='))).toMatch(/SameSite=Strict/);
    expect(cookies.find((c) => c.startsWith('tw_csrf='))).not.toMatch(/HttpOnly/);
    const audit = await AuditEventModel.findOne({ where: { action: 'auth.sign-in', entityId: String(user.id) } });
    expect(audit).not.toBeNull();
  });

  it('when the password is wrong, then 401 with a message and a failed sign-in is audited', async () => {
    const user = await createUser('operator');
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: 'not-the-password' });
    expect(res.status).toBe(401);
    expect(res.body.error.message).toMatch(/wrong/);
    expect(await AuditEventModel.count({ where: { action: 'auth.sign-in-failed', entityId: String(user.id) } })).toBe(1);
  });

  it('when the account is only invited, then sign-in is refused', async () => {
    const user = await createUser('operator', { status: 'invited' });
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(401);
  });

  it.each([
    ['missing fields', {}],
    ['wrong types', { email: 42, password: ['x'] }],
    ['huge strings', { email: `${'a'.repeat(5000)}@lab.example`, password: 'x'.repeat(5000) }],
    ['SQL metacharacters', { email: "' OR 1=1 --", password: "'; DROP TABLE users; --" }],
    ['not an object', 'just text'],
  ])('when the body has %s, then 400 with a message and nothing is written', async (_label, body) => {
    const before = await auditCount();
    const res = await request(t.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send(JSON.stringify(body));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toEqual(expect.any(String));
    expect(await auditCount()).toBe(before);
    expect(await UserModel.count({ where: { email: "' or 1=1 --" } })).toBe(0);
  });

  it('when the JSON is malformed, then 400 not 500', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
  });

  it('when the same account is tried too often, then the limiter answers 429 with advice', async () => {
    const user = await createUser('quality');
    const statuses: number[] = [];
    for (let i = 0; i < 6; i += 1) {
      const res = await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: 'wrong-password-x' });
      statuses.push(res.status);
      if (res.status === 429) expect(res.body.error.message).toMatch(/Too many sign-in attempts/);
    }
    expect(statuses.slice(0, 4)).toEqual([401, 401, 401, 401]);
    expect(statuses.slice(4)).toEqual([429, 429]);
  });

  it('when X-Forwarded-For is spoofed, then the limiter still counts the real address', async () => {
    const user = await createUser('quality');
    const statuses: number[] = [];
    for (let i = 0; i < 6; i += 1) {
      const res = await request(t.app)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', `10.0.0.${i}`)
        .send({ email: user.email, password: 'wrong-password-x' });
      statuses.push(res.status);
    }
    expect(statuses.at(-1)).toBe(429);
  });
});

describe('session', () => {
  it('when signed in, then the session endpoint names the person', async () => {
    const s = await signInAs(t.app, await createUser('engineer'));
    const res = await s.agent.get('/api/auth/session');
    expect(res.status).toBe(200);
    expect(res.body.user.id).toBe(s.user.id);
  });

  it('when the token has expired, then 401', async () => {
    const user = await createUser('engineer');
    const expired = jwt.sign({ tv: user.tokenVersion, csrf: 'x' }, t.env.JWT_SECRET, {
      algorithm: 'HS256',
      issuer: 'tracewright',
      audience: 'tracewright-session',
      subject: String(user.id),
      expiresIn: -10,
    });
    const res = await request(t.app).get('/api/auth/session').set('Cookie', `tw_session=${expired}`);
    expect(res.status).toBe(401);
  });

  it.each([
    ['the none algorithm', (sub: string, tv: number) => jwt.sign({ tv, csrf: 'x', sub }, '', { algorithm: 'none', issuer: 'tracewright', audience: 'tracewright-session' })],
    ['another secret', (sub: string, tv: number) => jwt.sign({ tv, csrf: 'x' }, 'y'.repeat(40), { algorithm: 'HS256', issuer: 'tracewright', audience: 'tracewright-session', subject: sub })],
    ['HS512', (sub: string, tv: number) => jwt.sign({ tv, csrf: 'x' }, t.env.JWT_SECRET, { algorithm: 'HS512', issuer: 'tracewright', audience: 'tracewright-session', subject: sub })],
    ['a wrong issuer', (sub: string, tv: number) => jwt.sign({ tv, csrf: 'x' }, t.env.JWT_SECRET, { algorithm: 'HS256', issuer: 'elsewhere', audience: 'tracewright-session', subject: sub })],
    ['a wrong audience', (sub: string, tv: number) => jwt.sign({ tv, csrf: 'x' }, t.env.JWT_SECRET, { algorithm: 'HS256', issuer: 'tracewright', audience: 'tracewright-device', subject: sub })],
    ['an old token version', (sub: string, tv: number) => jwt.sign({ tv: tv - 1, csrf: 'x' }, t.env.JWT_SECRET, { algorithm: 'HS256', issuer: 'tracewright', audience: 'tracewright-session', subject: sub })],
  ])('when the token uses %s, then 401', async (_label, forge) => {
    const user = await createUser('admin');
    const token = forge(String(user.id), user.tokenVersion);
    const res = await request(t.app).get('/api/users').set('Cookie', `tw_session=${token}`);
    expect(res.status).toBe(401);
  });

  it('when a person is deactivated, then their token in hand is refused at once', async () => {
    const s = await signInAs(t.app, await createUser('operator'));
    await UserModel.update({ status: 'deactivated' }, { where: { id: s.user.id } });
    const res = await s.agent.get('/api/auth/session');
    expect(res.status).toBe(401);
    expect(res.body.error.message).toMatch(/deactivated/);
  });

  it('when signed out, then the old token no longer works anywhere', async () => {
    const s = await signInAs(t.app, await createUser('engineer'));
    const cookie = s.agent.jar.getCookie('tw_session', { domain: '127.0.0.1', path: '/', secure: false, script: false });
    const out = await s.agent.post('/api/auth/sign-out').set('X-CSRF-Token', s.csrf);
    expect(out.status).toBe(204);
    const replay = await request(t.app).get('/api/auth/session').set('Cookie', `tw_session=${cookie?.value ?? 'missing'}`);
    expect(replay.status).toBe(401);
  });

  it('when a write lacks the CSRF header, then 403 and nothing changes', async () => {
    const admin = await signInAs(t.app, await createUser('admin'));
    const before = await auditCount();
    const res = await admin.agent.put('/api/settings').send({ labName: 'Forged', timeZone: 'UTC', paperSize: 'A4' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('CSRF_REJECTED');
    const wrong = await admin.agent.put('/api/settings').set('X-CSRF-Token', 'guess').send({ labName: 'Forged', timeZone: 'UTC', paperSize: 'A4' });
    expect(wrong.status).toBe(403);
    expect(await auditCount()).toBe(before);
  });
});
