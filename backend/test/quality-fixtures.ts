import { expect } from 'vitest';

import { DeviationDetailSchema, type DeviationDetail, type RunDetail } from '@tracewright/shared';

import { DeviationModel } from '../src/models/deviation.model';
import { TEST_PASSWORD, type SignedIn } from './fixtures';
import { createLot, createRunRecords, doStep, planRun, post, releasedVersion, runnableContent } from './run-fixtures';

/** What every signature request carries: the signer's own password (fixtures sign people in with it). */
export const SIGN = { password: TEST_PASSWORD };

export const STEP_IDS = ['plasma-1', 'print-ag-1', 'dry-ag-1', 'cure-ag-1', 'inspect-1'] as const;

/** A released version of the runnable recipe with fresh records, so a test may own its recipe. */
export async function runnableVersion() {
  const records = await createRunRecords();
  return { records, ...(await releasedVersion(runnableContent(records))) };
}

/** Plans a run of `quantity` pieces of a fresh released version. */
export async function freshRun(planner: SignedIn, quantity = 3): Promise<RunDetail & { versionRecipeId: number }> {
  const { versionId, recipeId } = await runnableVersion();
  return { ...(await planRun(planner, { versionId, quantity })), versionRecipeId: recipeId };
}

/** Reports a problem on a run through the tablet API; returns the deviation's id. */
export async function reportProblem(operator: SignedIn, runId: number, body: { severity?: string; description?: string; pieceIds?: number[]; stepId?: string | null } = {}): Promise<number> {
  const res = await post(operator, `/api/runs/${runId}/problems`, { stepId: 'print-ag-1', description: 'Ink pooled at the key 3 corner.', severity: 'minor', ...body });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.deviation.id as number;
}

/** A run planned with an expired ink lot (with its reason): it opens a lot-related deviation. */
export async function runWithExpiredLot(planner: SignedIn) {
  const { records, versionId } = await runnableVersion();
  const lot = await createLot('ink', records.inkId, { expiresOn: '2020-01-31' });
  const run = await planRun(planner, { versionId, quantity: 2, lots: [{ lotId: lot.id, reason: 'Only lot left; checked its viscosity today.' }] });
  const deviation = run.deviations.find((d) => d.rule === 'expired-lot');
  if (!deviation) throw new Error('planning with an expired lot should open a deviation');
  return { run, deviationId: deviation.id };
}

/** Does every step of a run in order, so it completes. */
export async function completeRun(operator: SignedIn, runId: number, stepIds: readonly string[] = STEP_IDS) {
  for (const stepId of stepIds) await doStep(operator, runId, stepId);
}

export async function getDetail(who: SignedIn, id: number): Promise<DeviationDetail> {
  const res = await who.agent.get(`/api/deviations/${id}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return DeviationDetailSchema.parse(res.body);
}

export const assign = (who: SignedIn, id: number, body: object = { assigneeId: who.user.id }) => post(who, `/api/deviations/${id}/assign`, body);
export const comment = (who: SignedIn, id: number, text = 'Looked at the strip under the scope.') => post(who, `/api/deviations/${id}/comments`, { text });
export const disposition = (who: SignedIn, id: number, body: object) =>
  post(who, `/api/deviations/${id}/disposition`, { ...SIGN, disposition: 'use-as-is', rationale: 'Within the customer tolerance; no function lost.', ...body });
export const closeIt = (who: SignedIn, id: number, body: object = {}) => post(who, `/api/deviations/${id}/close`, { ...SIGN, ...body });

export const stateOf = async (id: number) => (await DeviationModel.findByPk(id))?.state;
