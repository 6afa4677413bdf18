import { randomBytes } from 'node:crypto';

import type { Model, ModelStatic } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';

import { AuditEventModel } from '../src/models/audit-event.model';
import { signedInUser, type SignedIn } from './fixtures';
import type { TestContext } from './test-context';

/** One catalogue (inks, printers, …) as the shared API tests see it. */
export interface CatalogueCase {
  noun: string;
  path: string;
  listKey: string;
  entityType: string;
  model: ModelStatic<Model>;
  /** Parses every record the API answers with. */
  outputSchema: z.ZodType;
  /** The text field that names a record: 'name', or 'lotNumber' for lots. */
  nameField: string;
  /** A valid create body carrying this unique name (called inside tests, after beforeAll). */
  validBody(name: string): Record<string, unknown>;
  /** A second field to change on update, besides the name. */
  change: Record<string, unknown>;
  /** Bad values of this catalogue's own fields, beyond the shared ones. */
  badChanges: Array<[string, Record<string, unknown>]>;
}

export const uniqueName = (label: string) => `${label} ${randomBytes(4).toString('hex')}`;

/**
 * The behaviour every catalogue shares: create, list, read, update with optimistic versions,
 * archive and restore, validation, roles and audit. Each test makes its own rows.
 */
export function describeCatalogue(getContext: () => TestContext, c: CatalogueCase) {
  let engineer: SignedIn;
  let engineer2: SignedIn;
  let operator: SignedIn;
  let quality: SignedIn;
  beforeAll(async () => {
    const { app } = getContext();
    [engineer, engineer2, operator, quality] = await Promise.all([
      signedInUser(app, 'engineer'),
      signedInUser(app, 'engineer'),
      signedInUser(app, 'operator'),
      signedInUser(app, 'quality'),
    ]);
  });

  const write = (who: SignedIn, method: 'post' | 'put', url: string, body?: object) =>
    who.agent[method](url).set('X-CSRF-Token', who.csrf).send(body);
  const create = async (who = engineer, name = uniqueName(c.noun)) => {
    const res = await write(who, 'post', c.path, c.validBody(name));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body as { id: number; version: number } & Record<string, unknown>;
  };
  const auditActions = async (id: number) =>
    (await AuditEventModel.findAll({ where: { entityType: c.entityType, entityId: String(id) }, order: [['id', 'ASC']] })).map((e) => e.action);
  const writesBy = (who: SignedIn) => AuditEventModel.count({ where: { actorId: who.user.id } });

  describe(`${c.path}: the shared catalogue behaviour`, () => {
    it(`when an engineer creates a ${c.noun}, then it is listed, readable, parses with its schema and the creation is audited`, async () => {
      const name = uniqueName(c.noun);
      const created = await create(engineer, name);
      expect(c.outputSchema.parse(created)).toMatchObject({ [c.nameField]: name, version: 1, archived: false });
      const list = await operator.agent.get(c.path).query({ q: name });
      expect(list.status).toBe(200);
      expect(list.body[c.listKey].map((r: { id: number }) => r.id)).toEqual([created.id]);
      const one = await quality.agent.get(`${c.path}/${created.id}`);
      expect(one.body).toEqual(created);
      const audit = await AuditEventModel.findOne({ where: { action: `${c.entityType}.created`, entityId: String(created.id) } });
      expect(audit?.actorId).toBe(engineer.user.id);
      expect(audit?.afterJson).toMatchObject({ [c.nameField]: name });
    });

    it('when a client sends id, version, archived and createdAt on create, then they are ignored', async () => {
      const body = { ...c.validBody(uniqueName(c.noun)), id: 1, version: 99, archived: true, createdAt: '2000-01-01T00:00:00Z' };
      const res = await write(engineer, 'post', c.path, body);
      expect(res.status).toBe(201);
      expect(res.body).toMatchObject({ version: 1, archived: false });
      expect((await c.model.findByPk(res.body.id))?.get('createdAt')).not.toEqual(new Date('2000-01-01T00:00:00Z'));
    });

    it('when an engineer saves with the current version, then the change is kept, the version goes up and before/after are audited', async () => {
      const created = await create();
      const renamed = uniqueName(`${c.noun} renamed`);
      const res = await write(engineer, 'put', `${c.path}/${created.id}`, { ...c.validBody(renamed), ...c.change, version: 1 });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      expect(c.outputSchema.parse(res.body)).toMatchObject({ [c.nameField]: renamed, version: 2, ...c.change });
      const audit = await AuditEventModel.findOne({ where: { action: `${c.entityType}.updated`, entityId: String(created.id) } });
      expect(audit?.beforeJson).toMatchObject({ [c.nameField]: created[c.nameField], version: 1 });
      expect(audit?.afterJson).toMatchObject({ [c.nameField]: renamed, version: 2 });
    });

    it('when two engineers save from the same version, then the second gets 409 and the first one’s save stays', async () => {
      const created = await create();
      const first = uniqueName('first');
      const firstSave = await write(engineer, 'put', `${c.path}/${created.id}`, { ...c.validBody(first), version: 1 });
      expect(firstSave.status).toBe(200);
      const secondSave = await write(engineer2, 'put', `${c.path}/${created.id}`, { ...c.validBody(uniqueName('second')), version: 1 });
      expect(secondSave.status).toBe(409);
      expect(secondSave.body.error.message).toMatch(/Someone else saved .* first.*Nothing was lost/);
      expect(secondSave.body.error.details).toEqual({ currentVersion: 2 });
      const row = await c.model.findByPk(created.id);
      expect(row?.get(c.nameField)).toBe(first);
      expect(row?.get('version')).toBe(2);
      expect(await auditActions(created.id)).toEqual([`${c.entityType}.created`, `${c.entityType}.updated`]);
    });

    it('when an engineer archives and restores, then it leaves and rejoins the default list, and both are audited', async () => {
      const name = uniqueName(c.noun);
      const created = await create(engineer, name);
      const archived = await write(engineer, 'post', `${c.path}/${created.id}/archive`);
      expect(archived.body).toMatchObject({ archived: true, version: 2 });
      const ids = async (archivedFilter?: string) =>
        (await operator.agent.get(c.path).query({ q: name, ...(archivedFilter ? { archived: archivedFilter } : {}) })).body[c.listKey].map((r: { id: number }) => r.id);
      expect(await ids()).toEqual([]);
      expect(await ids('true')).toEqual([created.id]);
      expect(await ids('all')).toEqual([created.id]);
      const again = await write(engineer, 'post', `${c.path}/${created.id}/archive`);
      expect(again.body.version).toBe(2);
      const stale = await write(engineer, 'post', `${c.path}/${created.id}/restore`, { version: 1 });
      expect(stale.status).toBe(409);
      const restored = await write(engineer, 'post', `${c.path}/${created.id}/restore`, { version: 2 });
      expect(restored.body).toMatchObject({ archived: false, version: 3 });
      expect(await ids()).toEqual([created.id]);
      expect(await auditActions(created.id)).toEqual(['created', 'archived', 'restored'].map((v) => `${c.entityType}.${v}`));
    });

    const badBodies: Array<[string, (valid: Record<string, unknown>) => unknown]> = [
      ['no fields at all', () => ({})],
      ['a number as the name', (valid) => ({ ...valid, [c.nameField]: 42 })],
      ['a 10 000-character name', (valid) => ({ ...valid, [c.nameField]: 'x'.repeat(10_000) })],
      ['an array as the body', () => [1, 2]],
      ...c.badChanges.map(([label, change]): [string, (valid: Record<string, unknown>) => unknown] => [label, (valid) => ({ ...valid, ...change })]),
    ];
    it.each(badBodies)('when the body has %s, then 400 names the problem and nothing is written', async (_label, makeBody) => {
      const name = uniqueName(c.noun);
      const before = await writesBy(engineer);
      const res = await write(engineer, 'post', c.path, makeBody(c.validBody(name)) as object);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      expect(res.body.error.message.length).toBeGreaterThan(5);
      expect(await c.model.count({ where: { [c.nameField]: name } })).toBe(0);
      expect(await writesBy(engineer)).toBe(before);
    });

    it('when SQL metacharacters are in the name or the search, then they are kept and searched as plain text', async () => {
      const name = `Robert'); DROP TABLE ${c.listKey};-- 100%_ ${randomBytes(3).toString('hex')}`;
      const created = await create(engineer, name);
      expect(created[c.nameField]).toBe(name);
      const found = await operator.agent.get(c.path).query({ q: name });
      expect(found.body[c.listKey].map((r: { id: number }) => r.id)).toEqual([created.id]);
      // % and _ are wildcards in LIKE; searched as text they only match names that contain them.
      const percent = await operator.agent.get(c.path).query({ q: '%_' });
      for (const row of percent.body[c.listKey]) expect(row[c.nameField]).toContain('%_');
    });

    it('when an operator or quality tries to write, then 403 and nothing changes; both may read', async () => {
      const created = await create();
      const before = await writesBy(operator);
      expect((await write(operator, 'post', c.path, c.validBody(uniqueName(c.noun)))).status).toBe(403);
      expect((await write(quality, 'put', `${c.path}/${created.id}`, { ...c.validBody('q'), version: 1 })).status).toBe(403);
      expect((await write(operator, 'post', `${c.path}/${created.id}/archive`)).status).toBe(403);
      expect((await write(quality, 'post', `${c.path}/${created.id}/restore`)).status).toBe(403);
      expect((await c.model.findByPk(created.id))?.get('version')).toBe(1);
      expect(await writesBy(operator)).toBe(before);
      expect((await operator.agent.get(`${c.path}/${created.id}`)).status).toBe(200);
    });

    it('when the id is unknown, then 404; when it is not a whole number, then 400', async () => {
      const unknown = `${c.path}/2147483000`;
      expect((await engineer.agent.get(unknown)).status).toBe(404);
      expect((await write(engineer, 'put', unknown, { ...c.validBody(uniqueName(c.noun)), version: 1 })).status).toBe(404);
      expect((await write(engineer, 'post', `${unknown}/archive`)).status).toBe(404);
      expect((await engineer.agent.get(`${c.path}/abc`)).status).toBe(400);
      expect((await engineer.agent.get(`${c.path}/1.5`)).status).toBe(400);
    });

    it('when the list filter is not understood, then 400 with a message', async () => {
      expect((await operator.agent.get(c.path).query({ archived: 'maybe' })).status).toBe(400);
      expect((await operator.agent.get(c.path).query({ q: 'q'.repeat(121) })).status).toBe(400);
      expect((await operator.agent.get(`${c.path}?q=a&q=b`)).body.error.message).toMatch(/once/);
    });
  });
}
