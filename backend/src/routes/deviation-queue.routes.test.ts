import { randomBytes } from 'node:crypto';

import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { DeviationQueueSchema, PeopleListSchema } from '@tracewright/shared';

import { signedInUser, type SignedIn } from '../../test/fixtures';
import { freshRun, reportProblem } from '../../test/quality-fixtures';
import { createTestContext, TestClock, type TestContext } from '../../test/test-context';

let t: TestContext;
let clock: TestClock;
let engineer: SignedIn;
let quality: SignedIn;
let operator: SignedIn;
let otherOperator: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  clock = new TestClock();
  t.ctx.clock = clock;
  [engineer, quality, operator, otherOperator] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'operator'), signedInUser(t.app, 'operator')]);
});
afterAll(() => t.close());

const DAY = 86_400_000;
const word = () => `zq${randomBytes(4).toString('hex')}`;
const queue = async (who: SignedIn, query: Record<string, string | number>) => {
  const res = await who.agent.get('/api/deviations').query(query);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return DeviationQueueSchema.parse(res.body);
};

/** One run with four reported deviations: minor (print), major (cure), critical (no step), minor by another operator. */
async function seededRun() {
  const run = await freshRun(engineer, 3);
  const words = { minor: word(), major: word(), critical: word(), other: word() };
  const ids = {
    minor: await reportProblem(operator, run.id, { severity: 'minor', description: `Smear near ${words.minor} pad.` }),
    major: await reportProblem(operator, run.id, { severity: 'major', stepId: 'cure-ag-1', description: `Cure oven door ${words.major} open.` }),
    critical: await reportProblem(operator, run.id, { severity: 'critical', stepId: null, description: `Film tore ${words.critical}.` }),
    other: await reportProblem(otherOperator, run.id, { severity: 'minor', description: `Bubble ${words.other}.` }),
  };
  return { run, ids, words };
}

describe('deviation queue', () => {
  it('when quality filters by run, then every deviation of the run is listed newest first with its run, recipe, step and age', async () => {
    const { run, ids } = await seededRun();
    const page = await queue(quality, { runId: run.id });
    expect(page.total).toBe(4);
    expect(page.items.map((i) => i.id)).toEqual([ids.other, ids.critical, ids.major, ids.minor]);
    expect(page.items.find((i) => i.id === ids.major)).toMatchObject({ runCode: run.code, recipeCode: run.recipeCode, stepKind: 'cure', stepTitle: 'Cure silver', severity: 'major', state: 'open', assignee: null });
    expect(page.items.find((i) => i.id === ids.critical)).toMatchObject({ stepKind: null, stepTitle: null });
    expect(page.items.every((i) => i.ageDays >= 0 && i.ageDays < 1)).toBe(true);
    expect(page.countsByState).toEqual({ open: 4, 'in-review': 0, dispositioned: 0, closed: 0 });
  });

  it('when filtered by severity, step kind, operator, rule or recipe, then only matching deviations are counted and listed', async () => {
    const { run, ids } = await seededRun();
    const idsOf = async (query: Record<string, string | number>) => (await queue(quality, { runId: run.id, ...query })).items.map((i) => i.id).sort();
    expect(await idsOf({ severity: 'major,critical' })).toEqual([ids.major, ids.critical].sort());
    expect(await idsOf({ stepKind: 'print-pass' })).toEqual([ids.minor, ids.other].sort());
    expect(await idsOf({ operatorId: otherOperator.user.id })).toEqual([ids.other]);
    expect(await idsOf({ rule: 'expired-lot' })).toEqual([]);
    expect((await queue(quality, { recipeId: run.recipeId })).total).toBe(4);
  });

  it('when searching words of the text, then every word must match (full-text words and short ones alike)', async () => {
    const { ids, words } = await seededRun();
    expect((await queue(quality, { q: words.major })).items.map((i) => i.id)).toEqual([ids.major]);
    expect((await queue(quality, { q: `oven ${words.major}` })).items.map((i) => i.id)).toEqual([ids.major]);
    expect((await queue(quality, { q: `${words.major} ${words.minor}` })).total).toBe(0);
    expect((await queue(quality, { q: `${words.critical.slice(0, 7)} to` })).items.map((i) => i.id)).toEqual([ids.critical]);
  });

  it('when searching a 2-letter word that is not a stopword (a metal symbol such as Ag), then it must match like any other word', async () => {
    const run = await freshRun(engineer, 2);
    const tag = word();
    const silver = await reportProblem(operator, run.id, { description: `Ag trace ${tag} cracked at the bend.` });
    await reportProblem(operator, run.id, { description: `Carbon trace ${tag} cracked at the bend.` });
    expect((await queue(quality, { q: `${tag} Ag` })).items.map((i) => i.id)).toEqual([silver]);
    expect((await queue(quality, { q: `${tag} ag` })).items.map((i) => i.id)).toEqual([silver]);
    expect((await queue(quality, { q: `${tag} Cu` })).total).toBe(0);
  });

  it('when filtered by state, then the total follows the state and the counts by state ignore it', async () => {
    const { run, ids } = await seededRun();
    expect((await post(quality, `/api/deviations/${ids.major}/assign`, { assigneeId: quality.user.id })).status).toBe(200);
    const page = await queue(quality, { runId: run.id, state: 'in-review' });
    expect(page.items.map((i) => i.id)).toEqual([ids.major]);
    expect(page.total).toBe(1);
    expect(page.countsByState).toEqual({ open: 3, 'in-review': 1, dispositioned: 0, closed: 0 });
    expect(page.items[0]?.assignee).toEqual({ id: quality.user.id, name: quality.user.name });
  });

  it('when paging and sorting, then pages do not overlap and severity sorts critical first', async () => {
    const { run, ids } = await seededRun();
    const first = await queue(quality, { runId: run.id, pageSize: 3, page: 1 });
    const second = await queue(quality, { runId: run.id, pageSize: 3, page: 2 });
    expect([first.items.length, second.items.length, first.total]).toEqual([3, 1, 4]);
    expect(new Set([...first.items, ...second.items].map((i) => i.id)).size).toBe(4);
    const bySeverity = await queue(quality, { runId: run.id, sort: 'severity' });
    expect(bySeverity.items.slice(0, 2).map((i) => i.id)).toEqual([ids.critical, ids.major]);
    const oldest = await queue(quality, { runId: run.id, sort: 'oldest' });
    expect(oldest.items[0]?.id).toBe(ids.minor);
  });

  it('when filtered by a range of days, then only deviations raised on those days are listed', async () => {
    const run = await freshRun(engineer, 1);
    clock.advance(-20 * DAY);
    const old = await reportProblem(operator, run.id, { description: 'Raised three weeks ago.' });
    clock.advance(20 * DAY);
    const recent = await reportProblem(operator, run.id, { description: 'Raised today.' });
    const day = (offsetDays: number) => new Date(clock.now().getTime() + offsetDays * DAY).toISOString().slice(0, 10);
    expect((await queue(quality, { runId: run.id, from: day(-21), to: day(-19) })).items.map((i) => i.id)).toEqual([old]);
    expect((await queue(quality, { runId: run.id, from: day(-1) })).items.map((i) => i.id)).toEqual([recent]);
    expect((await queue(quality, { runId: run.id, to: day(-2) })).total).toBe(1);
  });

  it.each([
    ['an unknown state', { state: 'lost' }],
    ['a page size over 200', { pageSize: 1000 }],
    ['a date that is not a date', { from: '31/12/2026' }],
    ['an unknown sort', { sort: 'random' }],
    ['a search of over 100 characters', { q: 'x'.repeat(101) }],
  ])('when the query has %s, then 400', async (_label, query) => {
    expect((await quality.agent.get('/api/deviations').query(query)).status).toBe(400);
  });

  it('when an engineer or admin reads the queue, then it is served; an operator gets 403', async () => {
    const admin = await signedInUser(t.app, 'admin');
    expect((await engineer.agent.get('/api/deviations')).status).toBe(200);
    expect((await admin.agent.get('/api/deviations')).status).toBe(200);
    expect((await operator.agent.get('/api/deviations')).status).toBe(403);
  });

  it('when the pickers are read, then assignees are active quality people and operators are those who raised deviations', async () => {
    await seededRun();
    const assignees = PeopleListSchema.parse((await engineer.agent.get('/api/deviations/assignees')).body).people;
    expect(assignees).toContainEqual({ id: quality.user.id, name: quality.user.name });
    expect(assignees.some((p) => p.id === operator.user.id)).toBe(false);
    const operators = PeopleListSchema.parse((await quality.agent.get('/api/deviations/operators')).body).people;
    expect(operators).toEqual(expect.arrayContaining([{ id: operator.user.id, name: operator.user.name }, { id: otherOperator.user.id, name: otherOperator.user.name }]));
  });
});

function post(who: SignedIn, url: string, body: object) {
  return who.agent.post(url).set('X-CSRF-Token', who.csrf).send(body);
}
