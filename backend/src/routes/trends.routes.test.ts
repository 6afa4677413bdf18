import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { baselineLimits, capability, individualsChart, QualityDashboardSchema, TrendSchema, TrendSpecListSchema, type Trend } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { RunReadingModel } from '../models/run-reading.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { freshRun } from '../../test/quality-fixtures';
import { createRunRecords, planRun, post, releasedVersion, runnableContent } from '../../test/run-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let quality: SignedIn;
let operator: SignedIn;
beforeAll(async () => {
  t = await createTestContext();
  [engineer, quality, operator] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'quality'), signedInUser(t.app, 'operator')]);
});
afterAll(() => t.close());

// REFERENCES §6.1 I-MR worked example (illustrative data, derived results, tolerance ±0.1 %):
// line widths 52, 55, 51, 54, 53, 56, 52, 50, 54, 53 µm against LSL 44 / USL 60.
const WIDTHS = [52, 55, 51, 54, 53, 56, 52, 50, 54, 53];
const near = (actual: number | null | undefined, expected: number) => expect(Math.abs((actual ?? NaN) - expected) / Math.abs(expected)).toBeLessThan(0.001);

/** A recipe whose inspection reads a line width (44–60 µm), two runs of it, and the ten widths read across them in order. */
async function trendOfTenWidths() {
  const records = await createRunRecords();
  const content = runnableContent(records);
  const inspect = content.steps.at(-1) as { readingSpecs: object[] };
  inspect.readingSpecs.push({ id: 'width-um', name: 'Printed line width', unit: 'µm', lowerLimit: 44, upperLimit: 60 });
  const { versionId, recipeId } = await releasedVersion(content);
  const runs = [await planRun(engineer, { versionId, quantity: 1 }), await planRun(engineer, { versionId, quantity: 1 })];
  const start = Date.UTC(2026, 0, 5, 9, 0);
  const reading = (runId: number, value: number, minute: number, supersededById: number | null = null) =>
    RunReadingModel.create({ runId, stepId: 'inspect-1', specId: 'width-um', pieceId: null, value, unit: 'µm', correctedValue: null, ambientTempC: null, instrumentId: null, outOfLimits: false, supersededById, recordedBy: operator.user.id, recordedAt: new Date(start + minute * 60_000), deviceTime: null, madeOffline: false });
  const rows = [];
  for (const [i, value] of WIDTHS.entries()) rows.push(await reading((runs[i < 5 ? 0 : 1] as { id: number }).id, value, 10 * (i + 1)));
  // A first reading later corrected: it must not count.
  await reading(runs[0]?.id as number, 99, 5, rows[0]?.id);
  return { recipeId, runs, readingIds: rows.map((r) => r.id) };
}

const trend = async (who: SignedIn, recipeId: number, specId = 'width-um'): Promise<Trend> => {
  const res = await who.agent.get('/api/trends').query({ recipeId, specId });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return TrendSchema.parse(res.body);
};
const chartOf = (values: number[], frozen?: { mean: number; sigma: number }) => {
  const { movingRanges: _r, sigma: _s, ...chart } = individualsChart(values, frozen);
  return chart;
};

describe('trends', () => {
  it('when a spec has the ten widths of REFERENCES §6.1, then the points, chart and capability are the process library’s and the worked example’s', async () => {
    const { recipeId, readingIds } = await trendOfTenWidths();
    const got = await trend(engineer, recipeId);
    expect(got.points.map((p) => p.value)).toEqual(WIDTHS);
    expect(got.points.map((p) => p.readingId)).toEqual(readingIds);
    expect(got.chart).toEqual(chartOf(WIDTHS));
    expect(got.capability).toEqual(capability(WIDTHS, { lsl: 44, usl: 60 }));
    near(got.chart?.ucl, 60.389);
    near(got.chart?.lcl, 45.611);
    near(got.capability?.cp, 1.0829);
    near(got.capability?.cpk, 0.9475);
    expect(got).toMatchObject({ isProvisional: true, frozen: null, note: null, spec: { name: 'Printed line width', lowerLimit: 44, upperLimit: 60 } });
  });

  it('when specs and the dashboard are read, then the spec is listed with its 10 points and flagged for a Cpk under 1.33', async () => {
    const { recipeId } = await trendOfTenWidths();
    const specs = TrendSpecListSchema.parse((await quality.agent.get('/api/trends/specs')).body).specs;
    expect(specs).toContainEqual(expect.objectContaining({ recipeId, specId: 'width-um', name: 'Printed line width', unit: 'µm', points: 10 }));
    const dashboard = QualityDashboardSchema.parse((await engineer.agent.get('/api/quality/dashboard')).body);
    const low = dashboard.lowCapability.find((s) => s.recipeId === recipeId && s.specId === 'width-um');
    near(low?.cpk, 0.9475);
    expect(low?.n).toBe(10);
  });

  it('when a point is excluded without a reason, then 400; with one, then the chart is the library’s over the other nine and it is audited', async () => {
    const { recipeId, readingIds } = await trendOfTenWidths();
    const sixth = readingIds[5] as number;
    expect((await post(quality, '/api/trends/points', { readingId: sixth, excluded: true })).status).toBe(400);
    expect((await post(quality, '/api/trends/points', { readingId: sixth, excluded: true, reason: '' })).status).toBe(400);
    const res = await post(quality, '/api/trends/points', { readingId: sixth, excluded: true, reason: 'Meter lead was loose on this one.' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const got = TrendSchema.parse(res.body);
    const nine = WIDTHS.filter((_, i) => i !== 5);
    expect(got.chart).toEqual(chartOf(nine));
    expect(got.chart?.mean).not.toBe(53);
    expect((await trend(engineer, recipeId)).chart).toEqual(chartOf(nine));
    expect(got.points[5]).toMatchObject({ excluded: true, annotation: 'Meter lead was loose on this one.' });
    expect(await AuditEventModel.count({ where: { action: 'trend-point.excluded', entityId: String(sixth), actorId: quality.user.id } })).toBe(1);
    const back = await post(quality, '/api/trends/points', { readingId: sixth, excluded: false, reason: 'Lead re-checked; value stands.' });
    expect(TrendSchema.parse(back.body).chart).toEqual(chartOf(WIDTHS));
  });

  it('when limits are frozen from the first run, then the chart is centred on that baseline and the freeze is audited', async () => {
    const { recipeId, runs } = await trendOfTenWidths();
    const first = runs[0]?.id as number;
    expect((await post(quality, '/api/trends/freeze', { recipeId, specId: 'width-um', baselineRunIds: [first] })).status).toBe(400);
    const res = await post(quality, '/api/trends/freeze', { recipeId, specId: 'width-um', baselineRunIds: [first], reason: 'First two runs after the new head.' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const got = TrendSchema.parse(res.body);
    const limits = baselineLimits(WIDTHS.slice(0, 5));
    expect(got.frozen).toMatchObject({ baselineRunIds: [first], mean: limits.mean, sigma: limits.sigma, reason: 'First two runs after the new head.' });
    expect(got.chart).toEqual(chartOf(WIDTHS, limits));
    expect(await AuditEventModel.count({ where: { action: 'trend.limits-frozen', entityId: `${recipeId}:width-um` } })).toBe(1);
  });

  it('when the baseline names a run of another recipe, or runs with no points, then 422 at baselineRunIds', async () => {
    const { recipeId } = await trendOfTenWidths();
    const stranger = await freshRun(engineer, 1);
    const foreign = await post(quality, '/api/trends/freeze', { recipeId, specId: 'width-um', baselineRunIds: [stranger.id], reason: 'Wrong run' });
    expect(foreign.status).toBe(422);
    expect(foreign.body.error.details.fieldErrors.baselineRunIds).toBeDefined();
    const none = await post(quality, '/api/trends/freeze', { recipeId: stranger.recipeId, specId: 'w-line', baselineRunIds: [stranger.id], reason: 'No readings yet' });
    expect(none.status).toBe(422);
    expect(none.body.error.details.fieldErrors.baselineRunIds[0]).toMatch(/at least 2 included points/);
  });

  it('when the recipe or spec is unknown or missing, then 404 or 400; when an operator asks or an engineer curates, then 403', async () => {
    const { recipeId, readingIds } = await trendOfTenWidths();
    expect((await quality.agent.get('/api/trends').query({ recipeId, specId: 'nope' })).status).toBe(404);
    expect((await quality.agent.get('/api/trends').query({ recipeId: 99_999_999, specId: 'width-um' })).status).toBe(404);
    expect((await quality.agent.get('/api/trends').query({ recipeId })).status).toBe(400);
    expect((await operator.agent.get('/api/trends').query({ recipeId, specId: 'width-um' })).status).toBe(403);
    expect((await post(engineer, '/api/trends/points', { readingId: readingIds[0], excluded: true, reason: 'Not mine to say' })).status).toBe(403);
    expect((await post(quality, '/api/trends/points', { readingId: 99_999_999, excluded: true, reason: 'No such point' })).status).toBe(404);
  });
});
