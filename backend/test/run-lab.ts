import { afterAll, beforeAll } from 'vitest';

import type { RunDetail } from '@tracewright/shared';

import { signedInUser, type SignedIn } from './fixtures';
import { createRunRecords, doStep, planRun, post, releasedVersion, runnableContent, startStep } from './run-fixtures';
import { createTestContext, TestClock, type TestContext } from './test-context';

/** What a test file of the run write paths works with; the fields are filled in its beforeAll. */
export interface RunLab {
  t: TestContext;
  clock: TestClock;
  engineer: SignedIn;
  operator: SignedIn;
  /** A second tablet, for writes that race the first or need another person. */
  operator2: SignedIn;
  /** A released version of `runnableContent`, ready to plan runs of. */
  versionId: number;
  /** Plans a run of the released version as the engineer. */
  newRun(): Promise<RunDetail>;
  /** A step action (start, complete, not-done, …) posted from a tablet, with an Idempotency-Key when given. */
  step(runId: number, stepId: string, action: string, body?: object, who?: SignedIn, key?: string): ReturnType<typeof post>;
  /** A new run whose treatment and print pass are done and whose drying step is started, so timers may run. */
  dryingRun(): Promise<RunDetail>;
}

/**
 * Registers the file's beforeAll and afterAll: the app on the test database with a settable
 * clock, an engineer, two operators and a released recipe version.
 */
export function setUpRunLab(options: { runQuantity: number }): RunLab {
  const lab = {
    newRun: () => planRun(lab.engineer, { versionId: lab.versionId, quantity: options.runQuantity }),
    step: (runId, stepId, action, body = {}, who = lab.operator, key) => post(who, `/api/runs/${runId}/steps/${stepId}/${action}`, body, key),
    async dryingRun() {
      const run = await lab.newRun();
      await doStep(lab.operator, run.id, 'plasma-1');
      await doStep(lab.operator, run.id, 'print-ag-1');
      await startStep(lab.operator, run.id, 'dry-ag-1');
      return run;
    },
  } as RunLab;
  beforeAll(async () => {
    lab.t = await createTestContext();
    lab.clock = new TestClock();
    lab.t.ctx.clock = lab.clock;
    const { app } = lab.t;
    [lab.engineer, lab.operator, lab.operator2] = await Promise.all([signedInUser(app, 'engineer'), signedInUser(app, 'operator'), signedInUser(app, 'operator')]);
    ({ versionId: lab.versionId } = await releasedVersion(runnableContent(await createRunRecords())));
  });
  afterAll(() => lab.t.close());
  return lab;
}
