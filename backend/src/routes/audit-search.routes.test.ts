import { randomBytes } from 'node:crypto';

import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { AUDIT_CSV_HEADER, AuditPageSchema } from '@tracewright/shared';

import { signedInUser, type SignedIn } from '../../test/fixtures';
import { freshRun } from '../../test/quality-fixtures';
import { post } from '../../test/run-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let quality: SignedIn;
let admin: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  [engineer, quality, admin] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'admin')]);
});
afterAll(() => t.close());

const DAY = 86_400_000;
const day = (offsetDays: number) => new Date(Date.now() + offsetDays * DAY).toISOString().slice(0, 10);
const search = async (who: SignedIn, query: Record<string, string | number>) => {
  const res = await who.agent.get('/api/audit-events').query(query);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return AuditPageSchema.parse(res.body);
};

/** A run planned then held with a reason that looks like a spreadsheet formula and carries a unique word. */
async function heldRun() {
  const run = await freshRun(engineer, 1);
  const word = `zq${randomBytes(4).toString('hex')}`;
  const reason = `=HYPERLINK("http://example.invalid","${word}")`;
  expect((await post(engineer, `/api/runs/${run.id}/hold`, { reason })).status).toBe(200);
  return { run, word, reason };
}

describe('audit search', () => {
  it('when filtered by entity, actor and action prefix, then only that record’s matching events are listed, newest first', async () => {
    const { run, reason } = await heldRun();
    const page = await search(quality, { entityType: 'run', entityId: String(run.id), action: 'run.', actorId: engineer.user.id });
    expect(page.events.map((e) => e.action)).toEqual(['run.held', 'run.planned']);
    expect(page.events[0]).toMatchObject({ actorName: engineer.user.name, reason, entityId: String(run.id) });
    expect((await search(quality, { entityType: 'run', entityId: String(run.id), actorId: quality.user.id })).total).toBe(0);
  });

  it('when searching a word of the reason or the record, and a range of days, then the matching events are found', async () => {
    const { run, word } = await heldRun();
    expect((await search(admin, { q: word })).events.map((e) => e.action)).toEqual(['run.held']);
    expect((await search(admin, { q: `${run.code} planned` })).events.map((e) => `${e.action}:${e.entityId}`)).toContain(`run.planned:${run.id}`);
    expect((await search(admin, { q: word, from: day(-1), to: day(1) })).total).toBe(1);
    expect((await search(admin, { q: word, to: day(-3) })).total).toBe(0);
  });

  it.each([
    ['a date that is not a date', { from: 'yesterday' }],
    ['a search of over 100 characters', { q: 'x'.repeat(101) }],
    ['a page size over 200', { pageSize: 500 }],
  ])('when the search has %s, then 400', async (_label, query) => {
    expect((await quality.agent.get('/api/audit-events').query(query)).status).toBe(400);
  });
});

describe('audit export', () => {
  it('when quality exports the events of a record, then a CSV arrives with the header and every formula-like cell neutralised', async () => {
    const { run, word } = await heldRun();
    const res = await quality.agent.get('/api/audit-events/export.csv').query({ entityType: 'run', entityId: String(run.id) });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="audit-events-\d{4}-\d{2}-\d{2}\.csv"$/);
    const lines = res.text.split('\r\n');
    expect(lines[0]).toBe(AUDIT_CSV_HEADER.join(','));
    expect(lines).toHaveLength(4);
    const held = lines.find((l) => l.includes('run.held')) ?? '';
    expect(held).toContain(`"'=HYPERLINK(""http://example.invalid"",""${word}"")"`);
    expect(held).toContain(engineer.user.name);
  });

  it('when an engineer asks for the export or the log, then 403', async () => {
    expect((await engineer.agent.get('/api/audit-events/export.csv')).status).toBe(403);
    expect((await engineer.agent.get('/api/audit-events')).status).toBe(403);
  });
});
