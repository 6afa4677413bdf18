import { Writable } from 'node:stream';

import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

import { createLogger, scrubPath } from '../../src/lib/logger';
import * as auth from '../../src/services/auth.service';
import { createUser, signInAs, signedInUser, TEST_PASSWORD } from '../fixtures';
import { createTestContext, type TestContext } from '../test-context';

// Distinctive values, so a search of the log for them cannot match anything by chance.
const NEW_PASSWORD = 'log-probe-password-7f3a91';
const WRONG_PASSWORD = 'log-probe-wrong-c4e2d8';
const PIN = '73915';
const BEARER = 'log-probe-bearer-5b8e0c7d';

let t: TestContext;
const lines: string[] = [];
/** Every value that must never reach a log line; filled as the flows below produce them. */
const secrets = new Set<string>([TEST_PASSWORD, NEW_PASSWORD, WRONG_PASSWORD, PIN, BEARER]);

beforeAll(async () => {
  t = await createTestContext({ S3_ENDPOINT: 'http://127.0.0.1:9', SIGN_IN_LIMIT: '1000' });
  const sink = new Writable({
    write(chunk: Buffer, _encoding, done) {
      lines.push(...chunk.toString('utf8').split('\n').filter(Boolean));
      done();
    },
  });
  // The real logger, at its most talkative, writing where the test can read it.
  t.ctx.logger = createLogger('trace', sink);
  await runSecretBearingFlows();
}, 120_000);
afterAll(() => t.close());

const cookieValues = (res: request.Response) =>
  ([] as string[]).concat(res.headers['set-cookie'] ?? []).map((c) => c.split(';')[0]?.split('=')[1] ?? '').filter((v) => v.length > 8);
const tokenIn = (text: string) => /set-password\/([A-Za-z0-9_-]+)/.exec(text)?.[1] ?? '';

async function runSecretBearingFlows() {
  // Sign-in with a password, and a failed one.
  const operator = await createUser('operator');
  const signIn = await request(t.app).post('/api/auth/sign-in').send({ email: operator.email, password: TEST_PASSWORD });
  cookieValues(signIn).forEach((v) => secrets.add(v));
  secrets.add(signIn.body.csrfToken);
  await request(t.app).post('/api/auth/sign-in').send({ email: operator.email, password: WRONG_PASSWORD });

  // A PIN set, then used to switch on a trusted tablet; a wrong PIN too.
  const session = await signInAs(t.app, operator);
  secrets.add(session.csrf);
  await session.agent.put('/api/auth/pin').set('X-CSRF-Token', session.csrf).send({ pin: PIN, password: TEST_PASSWORD });
  await session.agent.post('/api/auth/pin-switch').send({ userId: operator.id, pin: PIN });
  await session.agent.post('/api/auth/pin-switch').send({ userId: operator.id, pin: '000000' });

  // An invitation accepted and a password reset completed, each with its mailed token.
  const admin = await signedInUser(t.app, 'admin');
  const email = `log-probe-${Date.now()}@lab.example`;
  await admin.agent.post('/api/users').set('X-CSRF-Token', admin.csrf).send({ email, name: 'Log Probe', role: 'engineer' });
  const invitation = tokenIn((await t.smtp.waitFor((m) => m.to.includes(email))).text);
  secrets.add(invitation);
  await request(t.app).get(`/api/auth/tokens/${invitation}`);
  const accepted = await request(t.app).post('/api/auth/tokens/complete').send({ token: invitation, password: NEW_PASSWORD });
  cookieValues(accepted).forEach((v) => secrets.add(v));
  await request(t.app).post('/api/auth/password-reset').send({ email: operator.email });
  const reset = tokenIn((await t.smtp.waitFor((m) => m.to.includes(operator.email) && m.text.includes('set-password'))).text);
  secrets.add(reset);
  await request(t.app).post('/api/auth/tokens/complete').send({ token: reset, password: NEW_PASSWORD });

  // Credentials in headers, a refused body carrying a password, and two server-side failures.
  await request(t.app).get('/api/users').set('Authorization', `Bearer ${BEARER}`).set('Cookie', `tw_session=${BEARER}`);
  await request(t.app).post('/api/auth/sign-in').send({ email: 'not-an-address', password: NEW_PASSWORD, pin: PIN });
  const broken = vi.spyOn(auth, 'previewToken').mockRejectedValueOnce(new Error('database went away'));
  await request(t.app).get(`/api/auth/tokens/${reset}`);
  broken.mockRestore();
  // File storage is unreachable in this context: the upload fails with 503 and a warning.
  await admin.agent.post('/api/files/artwork').set('X-CSRF-Token', admin.csrf).attach('file', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'), 'probe.svg');
}

describe('logs', () => {
  it('when the flows ran, then requests, a refusal and both failures were logged', () => {
    const parsed = lines.map((line) => JSON.parse(line) as Record<string, unknown>);
    expect(parsed.filter((l) => l.msg === 'request').length).toBeGreaterThan(15);
    expect(parsed.some((l) => l.msg === 'request' && l.status === 401 && l.route === '/api/auth/sign-in')).toBe(true);
    expect(parsed.some((l) => l.msg === 'unhandled error')).toBe(true);
    expect(parsed.some((l) => l.msg === 'artwork not stored')).toBe(true);
  });

  it('when any line is read, then it is JSON with a UTC ISO 8601 time and a level', () => {
    for (const line of lines) {
      const entry = JSON.parse(line) as { time?: unknown; level?: unknown };
      expect(entry.time, line).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);
      expect(typeof entry.level, line).toBe('number');
    }
  });

  it('when the log is searched for passwords, PINs, session and CSRF tokens, bearer values and one-time tokens, then none is found', () => {
    expect(secrets.size).toBeGreaterThanOrEqual(10);
    const log = lines.join('\n');
    for (const secret of secrets) expect(log.includes(secret), `found a secret starting ${secret.slice(0, 4)}…`).toBe(false);
  });

  it('when a failure is logged for a one-time-token path, then the path keeps the route, not the token', () => {
    const failure = lines.map((line) => JSON.parse(line) as { msg?: string; path?: string }).find((l) => l.msg === 'unhandled error');
    expect(failure?.path).toBe('/api/auth/tokens/[redacted]');
    expect(scrubPath('/set-password/abcDEF_123-xyz')).toBe('/set-password/[redacted]');
  });
});
