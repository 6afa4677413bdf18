/**
 * `npm run bench`: speed figures on this machine, each beside its target. Starts its own database;
 * not part of `npm test`. Exits non-zero when a budget is missed.
 */
import type { AddressInfo } from 'node:net';
import { performance } from 'node:perf_hooks';

import autocannon from 'autocannon';

import { recipeChecks } from '@tracewright/shared';

import { createApp } from '../backend/src/app';
import { closeAppContext, createAppContext, migrateDatabase } from '../backend/src/bootstrap';
import { loadEnv } from '../backend/src/config/env';
import { createLogger } from '../backend/src/lib/logger';
import { hashSecret } from '../backend/src/lib/secret-hashing';
import { UserModel } from '../backend/src/models/user.model';
import { buildFortyStepRecipe } from '../shared/src/rules/recipe/test-fixtures';
import { startThrowawayDatabase } from './lib/test-database';

interface Figure {
  name: string;
  value: number;
  unit: string;
  target: string;
  ok: boolean;
}

/** The builder reruns every process check on each edit: time a full recheck of a 40-step recipe. */
function measureRecipeRecheck(figures: Figure[]) {
  const input = buildFortyStepRecipe();
  for (let i = 0; i < 200; i += 1) recipeChecks(input); // warm-up: let the JIT settle
  const rounds = 2_000;
  const started = performance.now();
  for (let i = 0; i < rounds; i += 1) recipeChecks(input);
  const perRecheck = (performance.now() - started) / rounds;
  figures.push({ name: `recipe recheck, ${input.steps.length} steps (mean of ${rounds})`, value: perRecheck, unit: 'ms', target: '≤ 5 ms', ok: perRecheck <= 5 });
}

async function main() {
  const figures: Figure[] = [];
  measureRecipeRecheck(figures);
  const db = await startThrowawayDatabase('bench');
  try {
    const env = loadEnv({ ...db.env, JWT_SECRET: 'bench-'.padEnd(48, 'x'), LOG_LEVEL: 'silent', DB_POOL_MAX: '20', SIGN_IN_LIMIT: '100000' });
    await migrateDatabase(env);
    const ctx = createAppContext(env, createLogger('silent'));
    const server = createApp(ctx).listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

    // Password hashing: the cost every sign-in pays (argon2id, OWASP minimum parameters).
    const hashes = 10;
    const started = performance.now();
    for (let i = 0; i < hashes; i += 1) await hashSecret(`bench-password-${i}`);
    const perHash = (performance.now() - started) / hashes;
    figures.push({ name: 'argon2id hash (m=19 MiB, t=2)', value: perHash, unit: 'ms', target: '≤ 250 ms', ok: perHash <= 250 });

    await UserModel.create({ email: 'bench@lab.example', name: 'Bench', role: 'engineer', status: 'active', passwordHash: await hashSecret('bench-password') });
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'bench@lab.example', password: 'bench-password' }),
    });
    const cookie = signIn.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');

    // An authenticated read: token check + user row per request, the floor under every API call.
    const result = await autocannon({ url: `${base}/api/auth/session`, connections: 20, duration: 10, headers: { cookie } });
    figures.push({ name: 'GET /api/auth/session req/s (20 connections)', value: result.requests.average, unit: 'req/s', target: '≥ 500', ok: result.requests.average >= 500 });
    figures.push({ name: 'GET /api/auth/session p97.5 latency', value: result.latency.p97_5, unit: 'ms', target: '≤ 50 ms', ok: result.latency.p97_5 <= 50 });
    figures.push({ name: 'non-2xx responses', value: result.non2xx, unit: '', target: '0', ok: result.non2xx === 0 });

    server.close();
    await closeAppContext(ctx);
  } finally {
    await db.stop();
  }
  printTable(figures);
  process.exit(figures.every((f) => f.ok) ? 0 : 1);
}

function printTable(figures: Figure[]) {
  const width = Math.max(...figures.map((f) => f.name.length));
  console.log(`\n${'measure'.padEnd(width)}  ${'value'.padStart(10)}  target      result`);
  for (const f of figures) {
    const value = `${f.value.toFixed(f.value < 10 ? 2 : 0)} ${f.unit}`.trim();
    console.log(`${f.name.padEnd(width)}  ${value.padStart(10)}  ${f.target.padEnd(10)}  ${f.ok ? 'met' : 'MISSED'}`);
  }
}

void main();
