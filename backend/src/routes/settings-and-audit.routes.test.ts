import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AuditEventModel } from '../models/audit-event.model';
import { LabSettingsModel } from '../models/lab-settings.model';
import { signedInUser } from '../../test/fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(() => t.close());

describe('lab settings', () => {
  it('when an admin saves settings, then everyone signed in reads them and the change is audited', async () => {
    const admin = await signedInUser(t.app, 'admin');
    const body = { labName: 'Foxglove Flex Lab', timeZone: 'Europe/Lisbon', paperSize: 'Letter' };
    const saved = await admin.agent.put('/api/settings').set('X-CSRF-Token', admin.csrf).send(body);
    expect(saved.status).toBe(200);
    const operator = await signedInUser(t.app, 'operator');
    expect((await operator.agent.get('/api/settings')).body).toEqual(body);
    expect(await AuditEventModel.count({ where: { action: 'settings.updated' } })).toBeGreaterThan(0);
  });

  it.each([
    ['an unknown time zone', { labName: 'X', timeZone: 'Mars/Olympus', paperSize: 'A4' }],
    ['an unknown paper size', { labName: 'X', timeZone: 'UTC', paperSize: 'A3' }],
    ['an empty lab name', { labName: '  ', timeZone: 'UTC', paperSize: 'A4' }],
  ])('when settings carry %s, then 400 and nothing changes', async (_label, body) => {
    const admin = await signedInUser(t.app, 'admin');
    const before = await LabSettingsModel.findByPk(1);
    const res = await admin.agent.put('/api/settings').set('X-CSRF-Token', admin.csrf).send(body);
    expect(res.status).toBe(400);
    expect((await LabSettingsModel.findByPk(1))?.labName).toBe(before?.labName);
  });

  it('when an operator tries to change settings, then 403', async () => {
    const operator = await signedInUser(t.app, 'operator');
    const res = await operator.agent.put('/api/settings').set('X-CSRF-Token', operator.csrf).send({ labName: 'X', timeZone: 'UTC', paperSize: 'A4' });
    expect(res.status).toBe(403);
  });
});

describe('audit trail', () => {
  it('when quality reads the audit log, then sign-ins appear newest first with the actor named', async () => {
    const quality = await signedInUser(t.app, 'quality');
    const res = await quality.agent.get('/api/audit-events').query({ action: 'auth.sign-in', pageSize: 5 });
    expect(res.status).toBe(200);
    expect(res.body.events[0]).toMatchObject({ action: 'auth.sign-in', actorName: quality.user.name });
    expect(res.body.total).toBeGreaterThan(0);
  });

  it('when the application account tries to change or delete audit rows, then the database refuses', async () => {
    const row = await AuditEventModel.findOne({ order: [['id', 'DESC']] });
    await expect(t.ctx.sequelize.query(`UPDATE audit_events SET action = 'tampered' WHERE id = ${Number(row?.id)}`)).rejects.toThrow(/append-only/);
    await expect(t.ctx.sequelize.query(`DELETE FROM audit_events WHERE id = ${Number(row?.id)}`)).rejects.toThrow(/append-only/);
    expect((await AuditEventModel.findByPk(row?.id))?.action).toBe(row?.action);
  });

  it('when the application account tries to drop the audit trigger, then it lacks the right', async () => {
    await expect(t.ctx.sequelize.query('DROP TRIGGER audit_events_no_update')).rejects.toThrow();
  });

  it('when paging is out of range, then 400', async () => {
    const admin = await signedInUser(t.app, 'admin');
    expect((await admin.agent.get('/api/audit-events').query({ pageSize: 100000 })).status).toBe(400);
  });
});

describe('captured mail (development)', () => {
  it('when an admin opens the outgoing mail, then captured invitations are listed', async () => {
    const admin = await signedInUser(t.app, 'admin');
    await admin.agent.post('/api/users').set('X-CSRF-Token', admin.csrf).send({ email: 'captured@lab.example', name: 'Cap Tured', role: 'operator' });
    await t.smtp.waitFor((m) => m.to.includes('captured@lab.example'));
    const res = await admin.agent.get('/api/dev/mails');
    expect(res.status).toBe(200);
    expect(res.body.mails.some((m: { to: string[] }) => m.to.includes('captured@lab.example'))).toBe(true);
  });
});

describe('unknown routes and headers', () => {
  it('when an API route does not exist, then 404 JSON', async () => {
    const res = await request(t.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('NOT_FOUND');
  });

  it('when any response is sent, then security headers are set and X-Powered-By is not', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.headers['x-powered-by']).toBeUndefined();
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
    expect(res.headers['content-security-policy']).not.toMatch(/script-src[^;]*unsafe-inline/);
  });
});
