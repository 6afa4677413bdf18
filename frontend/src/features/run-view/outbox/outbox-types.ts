/** Every tablet write the outbox knows how to send, named for what the operator did. */
export type WriteKind =
  | 'acknowledge-safety'
  | 'start-step'
  | 'complete-step'
  | 'step-not-done'
  | 'start-timer'
  | 'stop-timer'
  | 'record-reading'
  | 'correct-reading'
  | 'cure-log'
  | 'confirm-lot'
  | 'nozzle-check'
  | 'upload-photo'
  | 'report-problem'
  | 'hold-run'
  | 'resume-run';

export type WriteStatus = 'waiting' | 'sent' | 'failed';

export type WriteError = { status: number; code: string; message: string; details?: unknown };

/** JSON the write carries; `{ $ref: itemId }` stands for the server id another write will get. */
export type WriteBody = Record<string, unknown>;

/**
 * One write kept in IndexedDB until the server has it. `id` names the write locally (and in
 * refs); `idempotencyKey` is what the server sees, renewed only when the operator changes the
 * body (confirming an out-of-limit reading), because a repeat key returns the first answer.
 */
export interface OutboxItem {
  id: string;
  idempotencyKey: string;
  seq: number;
  runId: number;
  userId: number;
  userName: string;
  kind: WriteKind;
  /** May hold `{ref:<itemId>}` tokens for ids not known yet (a timer started offline, then stopped). */
  path: string;
  body: WriteBody | null;
  /** Only for `upload-photo`: the picture itself, uploaded before the write that names it. */
  photo: Blob | null;
  stepId: string | null;
  /** The tablet's clock when the operator acted (ISO). */
  createdAt: string;
  madeOffline: boolean;
  status: WriteStatus;
  attempts: number;
  error: WriteError | null;
  /** The id of the record the server created or changed, once sent. */
  resultId: number | null;
  sentAt: string | null;
  /** Words and numbers for the screen only (never sent): labels, the local evaluation. */
  meta: Record<string, unknown>;
}

/** What a screen hands the outbox; the outbox adds ids, order, stamps and status. */
export interface WriteDraft {
  runId: number;
  kind: WriteKind;
  path: string;
  body?: WriteBody | null;
  photo?: Blob | null;
  stepId?: string | null;
  meta?: Record<string, unknown>;
}

/** A write the server turned down as already done elsewhere (409): dropped, and said so. */
export interface WriteNotice {
  id: string;
  kind: WriteKind;
  runId: number;
  stepId: string | null;
  message: string;
  details?: unknown;
}

export type OutboxPhase = 'idle' | 'sending' | 'offline' | 'retrying' | 'blocked' | 'other-person';

export interface OutboxState {
  items: OutboxItem[];
  phase: OutboxPhase;
  /** When the next automatic try happens (device ms), while retrying. */
  nextRetryAt: number | null;
  lastError: WriteError | null;
  notices: WriteNotice[];
  isLoaded: boolean;
  /** False when writes can only be kept in memory (no IndexedDB): a reload would lose them. */
  isDurable: boolean;
}
