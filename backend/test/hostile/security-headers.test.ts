import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { HSTS_VALUE } from '../../src/lib/transport-security';
import { createUser } from '../fixtures';
import { createTestContext, type TestContext } from '../test-context';

/** The lab's reverse proxy, one hop in front of the app, terminates TLS. */
let proxied: TestContext;
/** The default: no proxy is trusted, so forwarded headers are the client's word only. */
let direct: TestContext;

beforeAll(async () => {
  [proxied, direct] = await Promise.all([
    createTestContext({ TRUST_PROXY: '1', PUBLIC_URL: 'https://tracewright.lab.example', SIGN_IN_LIMIT: '3' }),
    createTestContext({ PUBLIC_URL: 'https://tracewright.lab.example', SIGN_IN_LIMIT: '3' }),
  ]);
});
afterAll(async () => {
  await Promise.all([proxied.close(), direct.close()]);
});

/** Directives of a Content-Security-Policy header, by name. */
function directives(csp: string | undefined): Map<string, string[]> {
  return new Map((csp ?? '').split(';').map((part) => part.trim().split(/\s+/)).filter((words) => words[0]).map(([name = '', ...values]) => [name, values]));
}

describe('security headers', () => {
  it.each([
    ['a JSON answer', '/api/health', 200],
    ['a refusal', '/api/users', 401],
    ['an unknown route', '/api/nothing-here', 404],
  ])('when %s is sent, then CSP allows no inline or evaluated script, frames nothing in, and sniffing is off', async (_label, path, status) => {
    const res = await request(direct.app).get(path);
    expect(res.status).toBe(status);
    const csp = directives(res.headers['content-security-policy']);
    const scripts = csp.get('script-src') ?? csp.get('default-src') ?? [];
    expect(scripts).toEqual(["'self'"]);
    expect(csp.get('default-src')).toEqual(["'self'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
    expect(res.headers['content-security-policy']).not.toMatch(/unsafe-eval|script-src[^;]*unsafe-inline/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('Strict-Transport-Security', () => {
  it('when a request reached the trusted proxy over TLS, then HSTS is sent for a year', async () => {
    const res = await request(proxied.app).get('/api/health').set('X-Forwarded-Proto', 'https');
    expect(res.headers['strict-transport-security']).toBe(HSTS_VALUE);
    expect(Number(/max-age=(\d+)/.exec(HSTS_VALUE)?.[1])).toBeGreaterThanOrEqual(31_536_000);
  });

  it('when a request came over plain HTTP, then no HSTS is sent, even though the public address is https', async () => {
    expect((await request(proxied.app).get('/api/health')).headers['strict-transport-security']).toBeUndefined();
    expect((await request(proxied.app).get('/api/health').set('X-Forwarded-Proto', 'http')).headers['strict-transport-security']).toBeUndefined();
  });

  it('when no proxy is trusted and a client claims X-Forwarded-Proto: https, then no HSTS is sent', async () => {
    const res = await request(direct.app).get('/api/health').set('X-Forwarded-Proto', 'https');
    expect(res.headers['strict-transport-security']).toBeUndefined();
  });
});

describe('rate limits and X-Forwarded-For', () => {
  it('when a client behind the trusted proxy varies a spoofed X-Forwarded-For, then the proxy’s own entry is counted and 429 follows', async () => {
    const user = await createUser('engineer');
    const statuses: number[] = [];
    for (let i = 0; i < 5; i += 1) {
      // The proxy appends the address it saw; everything left of it is the client's own text.
      const res = await request(proxied.app)
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', `10.9.${i}.1, 198.51.100.${i}, 203.0.113.7`)
        .send({ email: user.email, password: 'not-the-password' });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
  });

  it('when no proxy is trusted and every attempt claims another address, then the limiter still answers 429', async () => {
    const user = await createUser('engineer');
    const statuses: number[] = [];
    for (let i = 0; i < 5; i += 1) {
      const res = await request(direct.app).post('/api/auth/sign-in').set('X-Forwarded-For', `192.0.2.${i}`).send({ email: user.email, password: 'not-the-password' });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
  });

  it('when the same spoofed address is used for different accounts, then each account keeps its own allowance', async () => {
    const [a, b] = await Promise.all([createUser('operator'), createUser('operator')]);
    for (let i = 0; i < 3; i += 1) {
      await request(proxied.app).post('/api/auth/sign-in').set('X-Forwarded-For', '203.0.113.9').send({ email: a.email, password: 'wrong-password-1' });
    }
    const other = await request(proxied.app).post('/api/auth/sign-in').set('X-Forwarded-For', '203.0.113.9').send({ email: b.email, password: 'wrong-password-1' });
    expect(other.status).toBe(401);
  });
});
