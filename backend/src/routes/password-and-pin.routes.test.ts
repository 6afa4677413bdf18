import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { createUser, signInAs, signedInUser, TEST_PASSWORD, TEST_PIN } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext({ PIN_LIMIT: '3' });
});
afterAll(() => t.close());

describe('password reset', () => {
  it('when a person asks for a reset, then the mailed link sets a new password and the old one stops working', async () => {
    const user = await createUser('operator');
    const res = await request(t.app).post('/api/auth/password-reset').send({ email: user.email });
    expect(res.status).toBe(202);
    const mail = await t.smtp.waitFor((m) => m.to.includes(user.email));
    const token = /set-password\/([A-Za-z0-9_-]+)/.exec(mail.text)?.[1] ?? '';
    expect((await request(t.app).get(`/api/auth/tokens/${token}`)).body.purpose).toBe('password-reset');
    const done = await request(t.app).post('/api/auth/tokens/complete').send({ token, password: 'brand-new-password' });
    expect(done.status).toBe(200);
    expect((await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD })).status).toBe(401);
    expect((await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: 'brand-new-password' })).status).toBe(200);
  });

  it('when the address is unknown, then the same 202 answer and no mail', async () => {
    const before = t.smtp.mails.length;
    const res = await request(t.app).post('/api/auth/password-reset').send({ email: 'nobody-here@lab.example' });
    expect(res.status).toBe(202);
    expect(t.smtp.mails.length).toBe(before);
  });

  it('when the new password is too short, then 400 names the field', async () => {
    const res = await request(t.app).post('/api/auth/tokens/complete').send({ token: 'A'.repeat(43), password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fieldErrors.password[0]).toMatch(/at least 10/);
  });

  it('when the reset link has expired, then 410', async () => {
    const user = await createUser('quality');
    await request(t.app).post('/api/auth/password-reset').send({ email: user.email });
    const mail = await t.smtp.waitFor((m) => m.to.includes(user.email));
    const token = /set-password\/([A-Za-z0-9_-]+)/.exec(mail.text)?.[1] ?? '';
    const { OneTimeTokenModel } = await import('../models/one-time-token.model');
    await OneTimeTokenModel.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    expect((await request(t.app).post('/api/auth/tokens/complete').send({ token, password: 'brand-new-password' })).status).toBe(410);
  });
});

describe('PIN switching on a shared tablet', () => {
  it('when a person sets a PIN, then another person can switch to them on a tablet trusted by a password sign-in', async () => {
    const operator = await signedInUser(t.app, 'operator');
    const set = await operator.agent.put('/api/auth/pin').set('X-CSRF-Token', operator.csrf).send({ pin: TEST_PIN, password: TEST_PASSWORD });
    expect(set.status).toBe(204);

    const tablet = await signInAs(t.app, await createUser('operator'));
    const users = await tablet.agent.get('/api/auth/pin-users');
    expect(users.status).toBe(200);
    expect(users.body.users.map((u: { id: number }) => u.id)).toContain(operator.user.id);
    expect(JSON.stringify(users.body)).not.toContain('@');

    const switched = await tablet.agent.post('/api/auth/pin-switch').set('X-CSRF-Token', tablet.csrf).send({ userId: operator.user.id, pin: TEST_PIN });
    expect(switched.status).toBe(200);
    expect((await tablet.agent.get('/api/auth/session')).body.user.id).toBe(operator.user.id);
  });

  it('when the device was never trusted, then PIN switching is refused', async () => {
    const res = await request(t.app).get('/api/auth/pin-users');
    expect(res.status).toBe(401);
    expect(res.body.error.message).toMatch(/signed in with a password once/);
  });

  it('when the password is wrong, then the PIN is not set', async () => {
    const op = await signedInUser(t.app, 'operator');
    const res = await op.agent.put('/api/auth/pin').set('X-CSRF-Token', op.csrf).send({ pin: '1234', password: 'wrong-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fieldErrors.password).toBeDefined();
  });

  it.each([['abc'], ['12'], ['123456789'], [1234]])('when the PIN is %s, then 400', async (pin) => {
    const op = await signedInUser(t.app, 'operator');
    const res = await op.agent.put('/api/auth/pin').set('X-CSRF-Token', op.csrf).send({ pin, password: TEST_PASSWORD });
    expect(res.status).toBe(400);
  });

  it('when wrong PINs are tried too often, then 429', async () => {
    const target = await createUser('operator', { pin: TEST_PIN });
    const tablet = await signedInUser(t.app, 'engineer');
    const statuses: number[] = [];
    for (let i = 0; i < 5; i += 1) {
      const res = await tablet.agent.post('/api/auth/pin-switch').set('X-CSRF-Token', tablet.csrf).send({ userId: target.id, pin: '0000' });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
  });
});
