import { setTimeout as sleep } from 'node:timers/promises';

import type { MariadbInstance } from '../lib/mariadb';
import { getStatus, type Attempt } from './tablet-session';

/** When the database was down and what the health endpoint said meanwhile. */
export interface Outage {
  killedAt: number;
  /** How long mariadbd took to start again (InnoDB crash recovery included). */
  restartMs: number;
  /** When the restarted database answered a ping again. */
  backAt: number;
  /** When the app's health check said 200 again (null: not within the limit). */
  recoveredAt: number | null;
  /** GET /api/health while the database was down. */
  healthProbes: Attempt[];
  /** GET /api/health after the restart, until the first 200. */
  recoveryProbes: Attempt[];
  /** Whether the killed process really died of SIGKILL (not some clean shutdown). */
  wasKilledHard: boolean;
}

/**
 * Kills mariadbd with SIGKILL (no shutdown, no flush: InnoDB must recover on restart), keeps it
 * down for `downMs` while probing the server's health, then starts it again on the same port,
 * socket and data folder.
 */
export async function killDatabase(db: MariadbInstance, baseUrl: string, downMs: number): Promise<Outage> {
  const server = db.process();
  const exited = new Promise<NodeJS.Signals | null>((resolve) => server.once('exit', (_code, signal) => resolve(signal)));
  server.kill('SIGKILL');
  const signal = await exited;
  const killedAt = Date.now();
  const healthProbes: Attempt[] = [];
  while (Date.now() - killedAt < downMs) {
    healthProbes.push(await getStatus(baseUrl, '/api/health'));
    await sleep(250);
  }
  const restartFrom = Date.now();
  await db.restart();
  const backAt = Date.now();
  const recovery = await awaitRecovery(baseUrl, RECOVERY_LIMIT_MS);
  return { killedAt, restartMs: backAt - restartFrom, backAt, recoveredAt: recovery.recoveredAt, healthProbes, recoveryProbes: recovery.probes, wasKilledHard: signal === 'SIGKILL' };
}

/** The server must find its way back by itself, without a restart of its own, within this. */
export const RECOVERY_LIMIT_MS = 15_000;

async function awaitRecovery(baseUrl: string, withinMs: number): Promise<{ recoveredAt: number | null; probes: Attempt[] }> {
  const start = Date.now();
  const probes: Attempt[] = [];
  while (Date.now() - start < withinMs) {
    const probe = await getStatus(baseUrl, '/api/health');
    probes.push(probe);
    if (probe.status === 200) return { recoveredAt: Date.now(), probes };
    await sleep(100);
  }
  return { recoveredAt: null, probes };
}
