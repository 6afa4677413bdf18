import { performance } from 'node:perf_hooks';

import { recipeChecks } from '@tracewright/shared';

import { hashSecret } from '../../backend/src/lib/secret-hashing';
import { buildFortyStepRecipe } from '../../shared/src/rules/recipe/test-fixtures';
import type { Figure } from './figures-table';

/** The builder reruns every process check on each edit: a full recheck of a 40-step recipe, mean of many. */
function recipeRecheck(): Figure {
  const input = buildFortyStepRecipe();
  for (let i = 0; i < 200; i += 1) recipeChecks(input); // warm-up: let the JIT settle
  const rounds = 2_000;
  const started = performance.now();
  for (let i = 0; i < rounds; i += 1) recipeChecks(input);
  const perRecheck = (performance.now() - started) / rounds;
  return { group: 'core', name: `recipe recheck, ${input.steps.length} steps (mean of ${rounds})`, value: perRecheck, unit: 'ms', target: '≤ 5 ms', ok: perRecheck <= 5 };
}

/** The cost every sign-in pays (argon2id with the OWASP minimum parameters the backend uses). */
async function passwordHash(): Promise<Figure> {
  const hashes = 10;
  const started = performance.now();
  for (let i = 0; i < hashes; i += 1) await hashSecret(`bench-password-${i}`);
  const perHash = (performance.now() - started) / hashes;
  return { group: 'core', name: `argon2id hash, m=19 MiB t=2 (mean of ${hashes})`, value: perHash, unit: 'ms', target: '≤ 250 ms', ok: perHash <= 250 };
}

export async function measureCore(): Promise<Figure[]> {
  return [recipeRecheck(), await passwordHash()];
}
