import type { RunDetail } from '@tracewright/shared';

/** The run as the tablet last heard it from the server, with how far the tablet's clock was off. */
export interface RunSnapshot {
  runId: number;
  run: RunDetail;
  /** Server clock minus tablet clock (ms) when this was fetched: add it to `Date.now()` for server time. */
  clockOffsetMs: number;
  /** Tablet clock when the request left (ISO): writes sent before it are in this answer. */
  requestedAt: string;
  /** False when this came from the tablet's store or the service worker's cache, not the server now. */
  isFresh: boolean;
}
