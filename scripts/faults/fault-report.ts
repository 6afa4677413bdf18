import type { RoundResult } from './kill-round';

/** What db-kill.ts writes with --report: `npm test` and `npm run test:long` count its rounds. */
export interface FaultReport {
  rounds: RoundResult[];
  passed: number;
  failed: number;
  /** Set when the stack itself could not be started or a round crashed. */
  error: string | null;
  durationMs: number;
}

export const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

/** One line per round, with the figures the README quotes. */
export function roundLine(r: RoundResult, of: number): string {
  const verdict = r.problems.length === 0 ? 'passed' : 'FAILED';
  const fiveHundreds = Object.entries(r.statuses).filter(([s]) => s.startsWith('5') && s !== '503').reduce((n, [, c]) => n + c, 0);
  return (
    `[faults] round ${r.round}/${of} ${verdict}: ${r.acknowledged}/${r.writes} writes acknowledged (${r.replays} replayed, ${r.retried} retried); ` +
    `killed after ${r.killAfterAcks} acks with ${r.inFlightAtKill} in flight, down ${seconds(r.downMs)} (restart ${seconds(r.restartMs)}), healthy ${r.recoveryMs ?? '–'} ms after restart; ` +
    `${r.statuses['503'] ?? 0} × 503 (${r.unavailableDuringOutage} while down), ${fiveHundreds} × other 5xx, slowest answer ${r.slowestMs} ms; ` +
    `${r.lost} lost, ${r.duplicated} duplicated, ${r.auditMismatches} audit mismatches — ${seconds(r.durationMs)} (setup ${seconds(r.setupMs)})`
  );
}
