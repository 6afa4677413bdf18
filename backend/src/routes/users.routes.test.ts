import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AuditEventModel } from '../models/audit-event.model';
import { UserModel } from '../models/user.model';
import { createUser, signInAs, signedInUser, type SignedIn } from '../../test/fixtures';
import { createTestContext, uniqueEmail, type TestContext } from '../../test/test-context';

let t: TestContext;
let admin: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  admin = await signedInUser(t.app, 'admin');
});
afterAll(() => t.close());

const linkToken = (text: string) => {
  const match = /\/set-password\/([A-Za-z0-9_-]+)/.exec(text);
  if (!match?.[1]) throw new Error(`no link in mail: ${text}`);
  return match[1];
};

describe('invitations', () => {
  it('when an admin invites an engineer, then the mail carries a one-time link that sets a password and signs in', async () => {
    const email = uniqueEmail('new-engineer');
    const invite = await admin.agent.post('/api/users').set('X-CSRF-Token', admin.csrf).send({ email, name: 'Ines Varga', role: 'engineer' });
    expect(invite.status).toBe(201);
    expect(invite.body).toMatchObject({ email, role: 'engineer', status: 'invited' });

    const mail = await t.smtp.waitFor((m) => m.to.includes(email));
    expect(mail.subject).toMatch(/invited/);
    expect(mail.text).toContain('http://tablet.lab.example:8080/set-password/');
    const token = linkToken(mail.text);

    const preview = await request(t.app).get(`/api/auth/tokens/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toEqual({ email, name: 'Ines Varga', purpose: 'invitation' });

    const browser = request.agent(t.app);
    const done = await browser.post('/api/auth/tokens/complete').send({ token, password: 'a-long-new-password' });
    expect(done.status).toBe(200);
    expect(done.body.user).toMatchObject({ email, role: 'engineer' });
    expect((await browser.get('/api/auth/session')).status).toBe(200);
    expect((await UserModel.findOne({ where: { email } }))?.status).toBe('active');

    const again = await request(t.app).post('/api/auth/tokens/complete').send({ token, password: 'another-password-1' });
    expect(again.status).toBe(410);
    const signIn = await request(t.app).post('/api/auth/sign-in').send({ email, password: 'a-long-new-password' });
    expect(signIn.status).toBe(200);
  });

  it('when the address already has an account, then 409 and no second mail', async () => {
    const existing = await createUser('operator');
    const sent = t.smtp.mails.length;
    const res = await admin.agent.post('/api/users').set('X-CSRF-Token', admin.csrf).send({ email: existing.email, name: 'Dup', role: 'operator' });
    expect(res.status).toBe(409);
    expect(t.smtp.mails.length).toBe(sent);
  });

  it.each([
    ['no e-mail', { name: 'A', role: 'operator' }],
    ['a bad e-mail', { email: 'not-an-address', name: 'A', role: 'operator' }],
    ['an unknown role', { email: 'x@lab.example', name: 'A', role: 'superuser' }],
    ['a huge name', { email: 'y@lab.example', name: 'n'.repeat(10_000), role: 'operator' }],
    ['SQL in the name', { email: 'z@lab.example', name: "Robert'); DROP TABLE users;--", role: 42 }],
  ])('when the invitation has %s, then 400 with a message and no account', async (_label, body) => {
    const users = await UserModel.count();
    const res = await admin.agent.post('/api/users').set('X-CSRF-Token', admin.csrf).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.details.fieldErrors).toBeTypeOf('object');
    expect(await UserModel.count()).toBe(users);
  });

  it('when a link token is unknown or malformed, then 404 or 400', async () => {
    expect((await request(t.app).get(`/api/auth/tokens/${'A'.repeat(43)}`)).status).toBe(404);
    expect((await request(t.app).get('/api/auth/tokens/short')).status).toBe(400);
  });

  it('when an invitation is resent, then the older link stops working', async () => {
    const email = uniqueEmail('resend');
    const invite = await admin.agent.post('/api/users').set('X-CSRF-Token', admin.csrf).send({ email, name: 'Resend Me', role: 'quality' });
    const first = linkToken((await t.smtp.waitFor((m) => m.to.includes(email))).text);
    const resend = await admin.agent.post(`/api/users/${invite.body.id}/invitation`).set('X-CSRF-Token', admin.csrf);
    expect(resend.status).toBe(202);
    const mails = t.smtp.mails.filter((m) => m.to.includes(email));
    await expect.poll(() => t.smtp.mails.filter((m) => m.to.includes(email)).length).toBe(2);
    expect(mails.length).toBeGreaterThanOrEqual(1);
    expect((await request(t.app).get(`/api/auth/tokens/${first}`)).status).toBe(410);
  });
});

describe('changing people', () => {
  it('when an admin changes a role, then the person must sign in again and the change is audited', async () => {
    const person = await signedInUser(t.app, 'operator');
    const res = await admin.agent.patch(`/api/users/${person.user.id}`).set('X-CSRF-Token', admin.csrf).send({ role: 'engineer' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('engineer');
    expect((await person.agent.get('/api/auth/session')).status).toBe(401);
    const audit = await AuditEventModel.findOne({ where: { action: 'user.updated', entityId: String(person.user.id) } });
    expect(audit?.actorId).toBe(admin.user.id);
    expect(JSON.stringify(audit?.beforeJson)).toContain('operator');
    expect(JSON.stringify(audit?.afterJson)).toContain('engineer');
    expect(JSON.stringify(audit?.afterJson)).not.toContain('argon2');
  });

  it('when an admin deactivates a person, then their session ends at once and sign-in is refused', async () => {
    const person = await signedInUser(t.app, 'quality');
    const res = await admin.agent.patch(`/api/users/${person.user.id}`).set('X-CSRF-Token', admin.csrf).send({ status: 'deactivated' });
    expect(res.status).toBe(200);
    expect((await person.agent.get('/api/auth/session')).status).toBe(401);
    await expect(signInAs(t.app, person.user)).rejects.toThrow(/401/);
  });

  it('when an admin tries to deactivate themself, then 409', async () => {
    const res = await admin.agent.patch(`/api/users/${admin.user.id}`).set('X-CSRF-Token', admin.csrf).send({ status: 'deactivated' });
    expect(res.status).toBe(409);
  });

  it('when the person does not exist, then 404; when the id is not a number, then 400', async () => {
    expect((await admin.agent.patch('/api/users/99999999').set('X-CSRF-Token', admin.csrf).send({ role: 'engineer' })).status).toBe(404);
    expect((await admin.agent.patch('/api/users/abc').set('X-CSRF-Token', admin.csrf).send({ role: 'engineer' })).status).toBe(400);
    expect((await admin.agent.patch('/api/users/1').set('X-CSRF-Token', admin.csrf).send({})).status).toBe(400);
  });

  it('when extra fields such as a password hash or token version are sent, then they are ignored', async () => {
    const person = await createUser('operator');
    const res = await admin.agent
      .patch(`/api/users/${person.id}`)
      .set('X-CSRF-Token', admin.csrf)
      .send({ name: 'Renamed Person', passwordHash: 'x', tokenVersion: 999, email: 'evil@lab.example' });
    expect(res.status).toBe(200);
    const reloaded = await UserModel.findByPk(person.id);
    expect(reloaded?.name).toBe('Renamed Person');
    expect(reloaded?.email).toBe(person.email);
    expect(reloaded?.passwordHash).toBe(person.passwordHash);
  });

  it('when a non-admin lists people, then 403', async () => {
    const engineer = await signedInUser(t.app, 'engineer');
    expect((await engineer.agent.get('/api/users')).status).toBe(403);
  });
});
