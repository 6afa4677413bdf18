import { randomBytes } from 'node:crypto';

import { expect } from 'vitest';

import { DraftContentSchema, HeatSourceInputSchema, RunDetailSchema, type RunDetail } from '@tracewright/shared';

import { HeatSourceModel } from '../src/models/heat-source.model';
import { InkModel } from '../src/models/ink.model';
import { InstrumentModel } from '../src/models/instrument.model';
import { MaterialLotModel } from '../src/models/material-lot.model';
import { RecipeVersionModel } from '../src/models/recipe-version.model';
import { RecipeModel } from '../src/models/recipe.model';
import { contentHashOf } from '../src/services/recipe-dto';
import { createUser, type SignedIn } from './fixtures';
import { createProcessRecords, uniqueCode, type ProcessRecords } from './recipe-fixtures';

// Invented, plausible values: they exercise the run API, nothing more.

const tag = () => randomBytes(4).toString('hex');

/** The process records of recipe-fixtures, with the silver's TCR and pot life set, and a meter. */
export async function createRunRecords(): Promise<ProcessRecords & { instrumentId: number }> {
  const records = await createProcessRecords();
  await InkModel.update({ tcrPerK: 0.0039, potLifeHours: 24 }, { where: { id: records.inkId } });
  const meter = await InstrumentModel.create({ name: `Test meter ${tag()}`, kind: 'multimeter', serialNumber: '', calibrationDueOn: '2999-01-01', notes: '' });
  return { ...records, instrumentId: meter.id };
}

/**
 * Treat, print silver, dry (5–10 min), cure, measure. The print pass and the heat steps carry
 * cautions (solvent, nanoparticle, hot surface); the plasma step carries none.
 */
export function runnableContent(r: ProcessRecords) {
  return DraftContentSchema.parse({
    substrateId: r.substrateId,
    printerId: r.printerId,
    channelPlan: [{ channel: 'Ag', inkId: r.inkId }],
    heatSourceIds: [r.ovenId],
    treaterIds: [r.treaterId],
    changeNote: 'Run test recipe.',
    steps: [
      { id: 'plasma-1', kind: 'surface-treatment', title: 'Plasma-treat the film', params: { method: 'plasma', treaterId: r.treaterId, maxWaitBeforePrintMinutes: 30 } },
      { id: 'print-ag-1', kind: 'print-pass', title: 'Print silver traces', params: { inkId: r.inkId, channel: 'Ag', dpi: 1270, passes: 2 } },
      { id: 'dry-ag-1', kind: 'dry', title: 'Dry the silver', minMinutes: 5, maxMinutes: 10, params: { method: 'oven', heatSourceId: r.ovenId, temperatureC: 60 } },
      { id: 'cure-ag-1', kind: 'cure', title: 'Cure silver', params: { heatSourceId: r.ovenId, temperatureC: 110, minutes: 200 } },
      {
        id: 'inspect-1',
        kind: 'inspect',
        title: 'Measure the trace',
        params: { measure: 'Trace resistance pad to pad; line width under the scope' },
        readingSpecs: [
          { id: 'r-trace', name: 'Trace resistance', unit: 'Ω', target: 4.5, lowerLimit: 2, upperLimit: 9, traceLengthMm: 100, traceWidthMm: 1 },
          { id: 'w-line', name: 'Line width', unit: 'mm', lowerLimit: 0.9, upperLimit: 1.1, perPiece: true },
        ],
      },
    ],
  });
}

/** A recipe whose version 1 is released with `content`, written straight to the tables (release itself is tested elsewhere). */
export async function releasedVersion(content: object, state: 'released' | 'draft' = 'released'): Promise<{ versionId: number; recipeId: number; code: string }> {
  const author = await createUser('engineer');
  const code = uniqueCode('RUN');
  const recipe = await RecipeModel.create({ code, name: `Recipe ${code}`, product: 'Test strip', notes: '', createdBy: author.id });
  const parsed = DraftContentSchema.parse(content);
  const version = await RecipeVersionModel.create({ recipeId: recipe.id, number: 1, state, content: parsed, contentHash: contentHashOf(parsed), authorId: author.id });
  return { versionId: version.id, recipeId: recipe.id, code };
}

export async function createLot(materialType: 'ink' | 'substrate', materialId: number, dates: { openedOn?: string | null; expiresOn?: string | null } = {}) {
  return MaterialLotModel.create({ materialType, materialId, lotNumber: `L-${tag()}`, receivedOn: '2019-06-01', openedOn: dates.openedOn ?? null, expiresOn: dates.expiresOn ?? null, notes: '' });
}

export async function createOven(maxTempC: number, calibrationDueOn: string | null = null) {
  return HeatSourceModel.create(HeatSourceInputSchema.parse({ name: `Test oven ${tag()}`, kind: 'oven', maxTempC, calibrationDueOn }));
}

/** A POST as a tablet: CSRF header, and the Idempotency-Key when given. */
export function post(who: SignedIn, url: string, body: object = {}, key?: string) {
  const req = who.agent.post(url).set('X-CSRF-Token', who.csrf);
  return (key ? req.set('Idempotency-Key', key) : req).send(body);
}

/** Plans a run through the API and expects it planned. */
export async function planRun(who: SignedIn, body: object): Promise<RunDetail> {
  const res = await post(who, '/api/runs', body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return RunDetailSchema.parse(res.body);
}

/** Acknowledges and starts a step; expects both to pass. */
export async function startStep(who: SignedIn, runId: number, stepId: string) {
  expect((await post(who, `/api/runs/${runId}/steps/${stepId}/acknowledge-safety`)).status).toBe(200);
  const res = await post(who, `/api/runs/${runId}/steps/${stepId}/start`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res;
}

/** Acknowledges, starts and completes a step. */
export async function doStep(who: SignedIn, runId: number, stepId: string) {
  await startStep(who, runId, stepId);
  const res = await post(who, `/api/runs/${runId}/steps/${stepId}/complete`, { note: '' });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res;
}

export const newKey = () => `k-${randomBytes(8).toString('hex')}`;
