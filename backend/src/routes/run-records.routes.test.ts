import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { READINGS_CSV_HEADER } from '@tracewright/shared';
import { CureLogWriteResultSchema, ProblemWriteResultSchema, ReadingWriteResultSchema } from '@tracewright/shared';

import { DeviationModel } from '../models/deviation.model';
import { InstrumentModel } from '../models/instrument.model';
import { RunReadingModel } from '../models/run-reading.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { createLot, createRunRecords, doStep, planRun, post, releasedVersion, runnableContent } from '../../test/run-fixtures';
import { createTestContext, TestClock, type TestContext } from '../../test/test-context';

let t: TestContext;
let engineer: SignedIn;
let operator: SignedIn;
let quality: SignedIn;
let records: Awaited<ReturnType<typeof createRunRecords>>;
let versionId: number;
beforeAll(async () => {
  t = await createTestContext();
  t.ctx.clock = new TestClock();
  [engineer, operator, quality] = await Promise.all([signedInUser(t.app, 'engineer'), signedInUser(t.app, 'operator'), signedInUser(t.app, 'quality')]);
  records = await createRunRecords();
  ({ versionId } = await releasedVersion(runnableContent(records)));
});
afterAll(() => t.close());

const newRun = (body: object = {}) => planRun(engineer, { versionId, quantity: 2, ...body });
const reading = (runId: number, body: object) => post(operator, `/api/runs/${runId}/readings`, { stepId: 'inspect-1', specId: 'r-trace', ...body });
const readingsOf = (runId: number) => RunReadingModel.count({ where: { runId } });
const rulesOf = async (runId: number) => (await DeviationModel.findAll({ where: { runId }, order: [['id', 'ASC']] })).map((d) => d.rule);

describe('readings', () => {
  it('when a reading is within limits, then it is stored with the spec’s unit and no deviation', async () => {
    const run = await newRun();
    const res = await reading(run.id, { value: 4.4, instrumentId: records.instrumentId });
    expect(res.status).toBe(201);
    const body = ReadingWriteResultSchema.parse(res.body);
    expect(body.reading).toMatchObject({ value: 4.4, unit: 'Ω', outOfLimits: false, instrumentId: records.instrumentId, recordedBy: { id: operator.user.id }, supersededById: null });
    expect(body.evaluation).toMatchObject({ outOfLimits: false, limitsText: '2–9 Ω' });
    expect(body.deviations).toEqual([]);
  });

  it('when a resistance is read on a warm bench, then it is judged at 20 °C with the silver’s TCR', async () => {
    const run = await newRun();
    // 10.4 Ω at 60 °C with α 0.0039 /K is 10.4 / 1.156 ≈ 9.00 Ω at 20 °C: inside ≤ 9 Ω, though the raw value is not.
    const res = await reading(run.id, { value: 10.4, ambientTempC: 60 });
    expect(res.status).toBe(201);
    expect(res.body.reading.correctedValue).toBeCloseTo(8.9965, 3);
    expect(res.body.reading.outOfLimits).toBe(false);
  });

  it('when a reading is out of limits and not confirmed, then 422 carries the evaluation and nothing is stored; confirmed, then a deviation opens', async () => {
    const run = await newRun();
    const refused = await reading(run.id, { value: 12.5 });
    expect(refused.status).toBe(422);
    expect(refused.body.error.details.evaluation).toMatchObject({ outOfLimits: true, side: 'high', limitsText: '2–9 Ω' });
    expect(await readingsOf(run.id)).toBe(0);
    const pieceId = run.pieces[1]?.id;
    const kept = await reading(run.id, { value: 12.5, confirmOutOfLimits: true, specId: 'r-trace', pieceId });
    expect(kept.status).toBe(201);
    expect(kept.body.deviations).toEqual([expect.objectContaining({ rule: 'reading-out-of-limits', severity: 'major', stepId: 'inspect-1', pieceIds: [pieceId] })]);
    expect(kept.body.deviations[0]).toMatchObject({ expected: 'Trace resistance within 2–9 Ω.', actual: 'Read 12.5 Ω.' });
    expect(kept.body.deviations[0].title).toContain(run.pieces[1]?.code);
  });

  it('when the meter is past its calibration date, then the first reading opens one calibration-overdue deviation for the run, not one per reading', async () => {
    const run = await newRun();
    const meter = await InstrumentModel.create({ name: 'Old bench meter', kind: 'multimeter', serialNumber: '', calibrationDueOn: '2020-05-01', notes: '' });
    expect((await reading(run.id, { value: 5, instrumentId: meter.id })).body.deviations).toEqual([expect.objectContaining({ rule: 'calibration-overdue', title: 'Old bench meter used past its calibration date' })]);
    expect((await reading(run.id, { value: 5.1, instrumentId: meter.id })).body.deviations).toEqual([]);
    expect(await rulesOf(run.id)).toEqual(['calibration-overdue']);
  });

  it.each([
    ['NaN as text', { value: 'NaN' }],
    ['a value with its unit typed in', { value: '12 Ω' }],
    ['no value', { value: undefined }],
    ['no spec', { specId: undefined, value: 5 }],
    ['a malformed spec id', { specId: 'x', value: 5 }],
    ['a per-piece reading without its piece', { specId: 'w-line', value: 1 }],
    ['an ambient temperature of 500 °C', { value: 5, ambientTempC: 500 }],
  ])('when the reading has %s, then 400 and nothing is stored', async (_label, body) => {
    const run = await newRun();
    const res = await reading(run.id, body);
    expect(res.status).toBe(400);
    expect(await readingsOf(run.id)).toBe(0);
  });

  it('when the value is 1e400 in the raw JSON, then 400 (it is not finite) and nothing is stored', async () => {
    const run = await newRun();
    const res = await operator.agent
      .post(`/api/runs/${run.id}/readings`)
      .set('X-CSRF-Token', operator.csrf)
      .set('Content-Type', 'application/json')
      .send('{"stepId":"inspect-1","specId":"r-trace","value":1e400}');
    expect(res.status).toBe(400);
    expect(await readingsOf(run.id)).toBe(0);
  });

  it('when the spec, piece or instrument is unknown, then 404 and nothing is stored', async () => {
    const run = await newRun();
    const other = await newRun();
    expect((await reading(run.id, { specId: 'no-such-spec', value: 5 })).status).toBe(404);
    expect((await reading(run.id, { specId: 'w-line', value: 1, pieceId: other.pieces[0]?.id })).status).toBe(404);
    expect((await reading(run.id, { value: 5, instrumentId: 99_999_999 })).status).toBe(404);
    expect(await readingsOf(run.id)).toBe(0);
  });

  it('when a reading is corrected, then a new row holds the value, the original stays and points at it with the reason, and it cannot be corrected twice', async () => {
    const run = await newRun();
    const first = await reading(run.id, { value: 5 });
    const correctedRes = await post(operator, `/api/runs/${run.id}/readings/${first.body.reading.id}/correct`, { value: 5.5, reason: 'Probe slipped off the pad.' });
    expect(correctedRes.status).toBe(201);
    const body = ReadingWriteResultSchema.parse(correctedRes.body);
    expect(body.reading).toMatchObject({ value: 5.5, supersededById: null, correctionReason: 'Probe slipped off the pad.' });
    expect(body.superseded).toMatchObject({ id: first.body.reading.id, value: 5, supersededById: body.reading.id, correctionReason: 'Probe slipped off the pad.' });
    expect((await RunReadingModel.findByPk(first.body.reading.id))?.value).toBe(5);
    const twice = await post(operator, `/api/runs/${run.id}/readings/${first.body.reading.id}/correct`, { value: 6, reason: 'Again' });
    expect(twice.status).toBe(409);
    expect((await post(operator, `/api/runs/${run.id}/readings/${first.body.reading.id}/correct`, { value: 6 })).status).toBe(400);
    expect((await post(operator, `/api/runs/${run.id}/readings/99999999/correct`, { value: 6, reason: 'Nothing' })).status).toBe(404);
    // The database keeps the value as taken, whatever code tries.
    await expect(RunReadingModel.update({ value: 7 }, { where: { id: first.body.reading.id } })).rejects.toThrow(/kept as they were taken/);
    await expect(RunReadingModel.destroy({ where: { id: first.body.reading.id } })).rejects.toThrow(/never deleted/);
  });

  it('when the readings are exported, then the CSV is an attachment named after the run, with the correction shown', async () => {
    const run = await newRun();
    const first = await reading(run.id, { value: 5, instrumentId: records.instrumentId });
    await post(operator, `/api/runs/${run.id}/readings/${first.body.reading.id}/correct`, { value: 5.5, reason: 'Probe slipped' });
    await reading(run.id, { specId: 'w-line', value: 1.02, pieceId: run.pieces[0]?.id });
    const res = await quality.agent.get(`/api/runs/${run.id}/readings.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toBe(`attachment; filename="${run.code}-readings.csv"`);
    const lines = res.text.split('\r\n');
    expect(lines[0]).toBe(READINGS_CSV_HEADER.map((h) => (h.includes(',') ? `"${h}"` : h)).join(','));
    expect(lines).toHaveLength(5);
    expect(lines[1]).toMatch(new RegExp(`^${run.code},,Measure the trace,Trace resistance,5,Ω,`));
    expect(lines[1]).toMatch(/superseded by reading \d+ .*correction reason: Probe slipped/);
    expect(lines[3]).toContain(`${run.pieces[0]?.code},Measure the trace,Line width,1.02,mm`);
    expect((await quality.agent.get('/api/runs/99999999/readings.csv')).status).toBe(404);
  });
});

describe('cure logs, lot confirmations and nozzle checks', () => {
  it('when a cure log gives the silver less than its reference dose, then a cure-dose-short deviation opens; a full one opens none', async () => {
    const run = await newRun();
    const short = await post(operator, `/api/runs/${run.id}/cure-logs`, { stepId: 'cure-ag-1', samples: [{ minute: 0, tempC: 110 }, { minute: 20, tempC: 110 }] });
    expect(short.status).toBe(201);
    const body = CureLogWriteResultSchema.parse(short.body);
    expect(body.cureLog.doses).toEqual([expect.objectContaining({ inkId: records.inkId, canJudge: true, isShort: true })]);
    expect(body.deviations).toEqual([expect.objectContaining({ rule: 'cure-dose-short', severity: 'major', stepId: 'cure-ag-1' })]);
    const full = await post(operator, `/api/runs/${run.id}/cure-logs`, { stepId: 'cure-ag-1', samples: [{ minute: 0, tempC: 150 }, { minute: 45, tempC: 150 }] });
    expect(full.body.cureLog.doses[0]).toMatchObject({ isShort: false });
    expect(full.body.deviations).toEqual([]);
    expect((await post(operator, `/api/runs/${run.id}/cure-logs`, { stepId: 'dry-ag-1', samples: [{ minute: 0, tempC: 60 }, { minute: 5, tempC: 60 }] })).status).toBe(422);
    expect((await post(operator, `/api/runs/${run.id}/cure-logs`, { stepId: 'cure-ag-1', samples: [{ minute: 0, tempC: 150 }] })).status).toBe(400);
  });

  it('when a planned lot is confirmed at a step, then the step lists it once; a lot the run did not plan gives 422', async () => {
    const lot = await createLot('ink', records.inkId, { expiresOn: '2999-01-01' });
    const stranger = await createLot('ink', records.inkId, { expiresOn: '2999-01-01' });
    const run = await newRun({ lots: [{ lotId: lot.id }] });
    const confirm = (lotId: number) => post(operator, `/api/runs/${run.id}/lot-confirmations`, { stepId: 'print-ag-1', lotId });
    expect((await confirm(lot.id)).body.step.confirmedLotIds).toEqual([lot.id]);
    expect((await confirm(lot.id)).body.step.confirmedLotIds).toEqual([lot.id]);
    const refused = await confirm(stranger.id);
    expect(refused.status).toBe(422);
    expect(refused.body.error.details.fieldErrors.lotId[0]).toMatch(/not one run .* planned/);
  });

  it('when a nozzle check is recorded at a print pass, then the step shows the latest; at another step, 422', async () => {
    const run = await newRun();
    const check = (body: object) => post(operator, `/api/runs/${run.id}/nozzle-checks`, { stepId: 'print-ag-1', ...body });
    expect((await check({ passed: false })).body.step.nozzleCheck).toMatchObject({ passed: false, photoFileId: null });
    expect((await check({ passed: true })).body.step.nozzleCheck).toMatchObject({ passed: true });
    const atCure = await check({ passed: true, stepId: 'cure-ag-1' });
    expect(atCure.status).toBe(422);
    // The step's kind in words, as the recipe builder names it.
    expect(atCure.body.error.details.fieldErrors.stepId).toEqual([expect.stringMatching(/is of kind Cure\.$/)]);
    expect((await check({ passed: true, photoFileId: 99_999_999 })).status).toBe(422);
    expect((await check({})).status).toBe(400);
  });
});

describe('reported problems', () => {
  it('when an operator reports a major problem on pieces, then a reported deviation opens with them and quality is mailed', async () => {
    const run = await newRun();
    const pieceIds = [run.pieces[0]?.id];
    const res = await post(operator, `/api/runs/${run.id}/problems`, { stepId: 'print-ag-1', pieceIds, description: 'Ink pooled at the key 3 corner.', severity: 'major' });
    expect(res.status).toBe(201);
    const body = ProblemWriteResultSchema.parse(res.body);
    expect(body.deviation).toMatchObject({ rule: 'reported', severity: 'major', state: 'open', stepId: 'print-ag-1', pieceIds, actual: 'Ink pooled at the key 3 corner.', createdBy: { id: operator.user.id } });
    const mail = await t.smtp.waitFor((m) => m.to.includes(quality.user.email) && m.subject.includes(run.code));
    expect(mail.subject).toBe(`Major problem reported: run ${run.code}`);
    expect(mail.text).toContain('Ink pooled at the key 3 corner.');
    expect(mail.text).toContain(`/runs/${run.id}`);
  });

  it('when a problem names pieces of another run, a missing photo or an unknown severity, then it is refused and no deviation opens', async () => {
    const run = await newRun();
    const other = await newRun();
    const report = (body: object) => post(operator, `/api/runs/${run.id}/problems`, { description: 'Smudge on the tail.', severity: 'minor', ...body });
    expect((await report({ pieceIds: [other.pieces[0]?.id] })).status).toBe(422);
    expect((await report({ photoFileIds: [99_999_999] })).status).toBe(422);
    expect((await report({ severity: 'catastrophic' })).status).toBe(400);
    expect((await report({ description: '' })).status).toBe(400);
    expect(await rulesOf(run.id)).toEqual([]);
    expect((await report({})).status).toBe(201);
    expect(await rulesOf(run.id)).toEqual(['reported']);
  });

  it('when a run is completed, then a problem can still be reported on it, and the run detail lists every deviation with its count', async () => {
    const run = await newRun();
    for (const id of ['plasma-1', 'print-ag-1', 'dry-ag-1', 'cure-ag-1', 'inspect-1']) await doStep(operator, run.id, id);
    const res = await post(operator, `/api/runs/${run.id}/problems`, { description: 'Found a crack after packing.', severity: 'minor' });
    expect(res.status).toBe(201);
    expect(res.body.runState).toBe('completed');
    const detail = await engineer.agent.get(`/api/runs/${run.id}`);
    expect(detail.body).toMatchObject({ state: 'completed', doneSteps: 5, openDeviations: 1 });
  });
});
