/**
 * One autocannon round, run as its own process so the load generator does not share the
 * server's event loop. Reads a LoadJob (JSON file named by argv[2]); prints a LoadResult as the
 * last line of stdout. The real route gets a fresh run/step and Idempotency-Key per request.
 */
import { randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';

import autocannon from 'autocannon';

export interface LoadJob {
  url: string;
  connections: number;
  seconds: number;
  headers: Record<string, string>;
  /** [runId, stepId] pairs to complete, one per request, from `offset` on; absent for the baseline. */
  targets?: Array<[number, string]>;
  offset?: number;
}

export interface LoadResult {
  requestsPerSecond: number;
  latenciesMs: number[];
  non2xx: number;
  errors: number;
  /** How many targets this round used up, so the next round starts after them. */
  used: number;
  firstProblem: string | null;
}

async function main() {
  const job = JSON.parse(readFileSync(process.argv[2] as string, 'utf8')) as LoadJob;
  let next = job.offset ?? 0;
  let firstProblem: string | null = null;
  const request: autocannon.Request = {
    method: 'POST',
    path: job.targets ? '/' : new URL(job.url).pathname,
    headers: { 'content-type': 'application/json', ...job.headers },
    body: JSON.stringify({ note: '' }),
    setupRequest: (req) => {
      if (!job.targets) return req;
      const target = job.targets[next % job.targets.length] as [number, string];
      next += 1;
      const headers = { ...req.headers, 'idempotency-key': `bench-${randomBytes(9).toString('base64url')}` };
      return { ...req, path: `/api/runs/${target[0]}/steps/${target[1]}/complete`, headers };
    },
    onResponse: (status, body) => {
      if (status >= 300 && firstProblem === null) firstProblem = `${status} ${body.slice(0, 300)}`;
    },
  };
  const latenciesMs: number[] = [];
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const options = { url: new URL(job.url).origin, connections: job.connections, duration: job.seconds, requests: [request] };
    const instance = autocannon(options, (error, done) => (error ? reject(error) : resolve(done)));
    instance.on('response', (_client, _status, _bytes, responseTime) => latenciesMs.push(responseTime));
  });
  const out: LoadResult = { requestsPerSecond: result.requests.total / job.seconds, latenciesMs, non2xx: result.non2xx, errors: result.errors + result.timeouts, used: next - (job.offset ?? 0), firstProblem };
  console.log(JSON.stringify(out));
}

void main();
