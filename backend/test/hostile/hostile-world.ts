import { expect } from 'vitest';

import { ROLES, type Role } from '@tracewright/shared';

import { createUser, signedInUser, TEST_PIN, type SignedIn } from '../fixtures';
import { createRecipe, saveDraft } from '../recipe-fixtures';
import { createLot, createRunRecords, doStep, planRun, post, releasedVersion, runnableContent, startStep } from '../run-fixtures';
import type { TestContext } from '../test-context';

/**
 * A small lab, made once per hostile test file: a person per role, the catalogue records, a recipe
 * with a draft, a released version, a run under way (a reading, a running timer) and a deviation.
 * Fuzzed and forged requests aim at these ids; everything else they aim at must not exist.
 */
export interface HostileWorld {
  sessions: Record<Role, SignedIn>;
  /** Signed in once with a password, so it carries the trusted-device cookie; used for public routes. */
  visitor: SignedIn;
  /** A person the admin may change (never one of the signed-in actors). */
  targetUserId: number;
  /** Has a PIN, for PIN switching. */
  pinUserId: number;
  records: Awaited<ReturnType<typeof createRunRecords>>;
  lotId: number;
  recipeId: number;
  draftId: number;
  releasedVersionId: number;
  releasedRecipeId: number;
  runId: number;
  /** Planned only: held, resumed and cancelled by the fuzzer, so the run under way keeps taking writes. */
  spareRunId: number;
  readingId: number;
  timerId: number;
  deviationId: number;
}

export async function buildHostileWorld(t: TestContext): Promise<HostileWorld> {
  const sessions = {} as Record<Role, SignedIn>;
  for (const role of ROLES) sessions[role] = await signedInUser(t.app, role);
  const visitor = await signedInUser(t.app, 'operator');
  const target = await createUser('operator');
  const pinUser = await createUser('operator', { pin: TEST_PIN });

  const records = await createRunRecords();
  const lot = await createLot('ink', records.inkId, { expiresOn: '2999-12-31' });
  const { recipeId, draftId } = await createRecipe(sessions.engineer);
  await saveDraft(sessions.engineer, draftId, runnableContent(records));
  const released = await releasedVersion(runnableContent(records));

  const { operator } = sessions;
  const spare = await planRun(sessions.engineer, { versionId: released.versionId, quantity: 1 });
  const run = await planRun(sessions.engineer, { versionId: released.versionId, quantity: 3 });
  await doStep(operator, run.id, 'plasma-1');
  await doStep(operator, run.id, 'print-ag-1');
  await startStep(operator, run.id, 'dry-ag-1');
  const timer = await post(operator, `/api/runs/${run.id}/timers`, { stepId: 'dry-ag-1', label: 'Dry', plannedSeconds: 420 });
  expect(timer.status, JSON.stringify(timer.body)).toBe(201);
  const reading = await post(operator, `/api/runs/${run.id}/readings`, { stepId: 'inspect-1', specId: 'r-trace', value: 4.4 });
  expect(reading.status, JSON.stringify(reading.body)).toBe(201);
  const problem = await post(operator, `/api/runs/${run.id}/problems`, { stepId: 'print-ag-1', description: 'Ink pooled at a corner.', severity: 'minor' });
  expect(problem.status, JSON.stringify(problem.body)).toBe(201);

  return {
    sessions,
    visitor,
    targetUserId: target.id,
    pinUserId: pinUser.id,
    records,
    lotId: lot.id,
    recipeId,
    draftId,
    releasedVersionId: released.versionId,
    releasedRecipeId: released.recipeId,
    runId: run.id,
    spareRunId: spare.id,
    readingId: reading.body.reading.id as number,
    timerId: timer.body.timer.id as number,
    deviationId: problem.body.deviation.id as number,
  };
}
