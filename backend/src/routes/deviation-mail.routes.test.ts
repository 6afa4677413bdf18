import { execFile } from 'node:child_process';
import { join } from 'node:path';
import { promisify } from 'node:util';

import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';

import { DeviationDigestResultSchema } from '@tracewright/shared';

import { AuditEventModel } from '../models/audit-event.model';
import { DeviationModel } from '../models/deviation.model';
import { HeatSourceModel } from '../models/heat-source.model';
import { signedInUser, type SignedIn } from '../../test/fixtures';
import { freshRun, reportProblem, runnableVersion, runWithExpiredLot } from '../../test/quality-fixtures';
import { planRun, post } from '../../test/run-fixtures';
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

const ROOT = join(import.meta.dirname, '..', '..', '..');

describe('deviation mail', () => {
  it('when planning raises an automatic major deviation, then every active quality person is mailed at once with its link', async () => {
    const { run, deviationId } = await runWithExpiredLot(engineer);
    const mail = await t.smtp.waitFor((m) => m.to.includes(quality.user.email) && m.subject.includes(run.code));
    expect(mail.subject).toMatch(new RegExp(`^Major deviation on run ${run.code}: Expired lot L-`));
    expect(mail.text).toContain(`http://tablet.lab.example:8080/deviations/${deviationId}`);
    expect(mail.text).toMatch(/Expected: .* used by its expiry date, 2020-01-31\./);
  });

  it('when an automatic deviation is minor, then nobody is mailed', async () => {
    const { records, versionId } = await runnableVersion();
    await HeatSourceModel.update({ calibrationDueOn: '2020-03-01' }, { where: { id: records.ovenId } });
    const run = await planRun(engineer, { versionId, quantity: 1, equipment: [{ kind: 'heat-source', id: records.ovenId, reason: 'Checked with the logger today.' }] });
    expect(run.deviations.map((d) => d.severity)).toEqual(['minor']);
    expect(t.smtp.mails.some((m) => m.subject.includes(run.code))).toBe(false);
  });

  it('when quality sends the digest now, then the SMTP fake receives it with the counts and the queue link, and it is audited', async () => {
    const run = await freshRun(engineer, 1);
    await reportProblem(operator, run.id, { severity: 'critical', description: 'Heater shorted at the bend.' });
    const res = await post(quality, '/api/deviations/digest');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const result = DeviationDigestResultSchema.parse(res.body);
    expect(result.sent).toBe(true);
    expect(result.openDeviations).toBeGreaterThanOrEqual(1);
    const mail = await t.smtp.waitFor((m) => m.to.includes(quality.user.email) && /deviations? not yet closed$/.test(m.subject));
    expect(mail.text).toMatch(/critical/);
    expect(mail.text).toContain('http://tablet.lab.example:8080/deviations');
    expect(await AuditEventModel.count({ where: { action: 'deviation.digest-sent', actorId: quality.user.id } })).toBe(1);
  });

  it('when an engineer asks for the digest, then 403; an admin may send it', async () => {
    expect((await post(engineer, '/api/deviations/digest')).status).toBe(403);
    const admin = await signedInUser(t.app, 'admin');
    expect((await post(admin, '/api/deviations/digest')).status).toBe(200);
  });

  it('when the digest command runs with the server’s settings, then it mails the digest and exits 0', async () => {
    const env = { ...process.env, ...inject('dbEnv'), JWT_SECRET: t.env.JWT_SECRET, SMTP_PORT: String(t.smtp.port), MAIL_CAPTURE_DIR: t.env.MAIL_CAPTURE_DIR, PUBLIC_URL: t.env.PUBLIC_URL, LOG_LEVEL: 'silent' };
    const before = t.smtp.mails.length;
    const { stdout } = await promisify(execFile)(join(ROOT, 'node_modules', '.bin', 'tsx'), ['backend/src/commands/send-deviation-digest.ts'], { cwd: ROOT, env });
    expect(stdout).toMatch(/\[digest\] \d+ deviation\(s\) not closed; digest sent to \d+ quality (person|people)\./);
    expect(t.smtp.mails.length).toBeGreaterThan(before);
  });
});

describe('when the mail server is away', () => {
  let broken: TestContext;
  beforeAll(async () => {
    // Port 1 on loopback refuses at once: the mail server is "down".
    broken = await createTestContext({ SMTP_PORT: '1' });
  });
  afterAll(() => broken.close());

  it('when a major problem is reported, then it is still recorded (the mail failure is only logged); the digest answers 503', async () => {
    const [planner, reporter, signer] = await Promise.all([signedInUser(broken.app, 'engineer'), signedInUser(broken.app, 'operator'), signedInUser(broken.app, 'quality')]);
    const run = await freshRun(planner, 1);
    const id = await reportProblem(reporter, run.id, { severity: 'major' });
    expect(await DeviationModel.count({ where: { id } })).toBe(1);
    const digest = await post(signer, '/api/deviations/digest');
    expect(digest.status).toBe(503);
    expect(digest.body.error.message).toMatch(/did not accept the deviation digest/);
  });
});
