import { createHash } from 'node:crypto';

import type { Request, Response } from 'express';

import { canonicalJson } from '@tracewright/shared';

import { badRequest } from '../errors/app-error';
import type { TabletWrite, WriteResult } from '../services/idempotency.service';
import { currentUser } from './authenticate';

const KEY_PATTERN = /^[A-Za-z0-9_-]{1,100}$/;
const KEY_RULE = 'The Idempotency-Key header must be 1–100 letters, digits, - or _ (the tablet makes one per write).';

/**
 * Reads the Idempotency-Key of a tablet write, after authentication (keys are per person).
 * `fingerprint` is what makes two requests the same one: the JSON body by default; an upload
 * passes its file's hash. Hashed canonically, so key order in the JSON does not matter.
 */
export function tabletWrite(req: Request, fingerprint: unknown = req.body ?? null): TabletWrite {
  const actor = currentUser(req);
  const key = req.get('Idempotency-Key');
  if (key === undefined) return { actor, claim: null };
  if (!KEY_PATTERN.test(key)) throw badRequest(KEY_RULE, { formErrors: [KEY_RULE], fieldErrors: {} });
  const requestHash = createHash('sha256').update(canonicalJson({ method: req.method, path: req.path, body: fingerprint }), 'utf8').digest('hex');
  return { actor, claim: { userId: actor.id, key, method: req.method, path: req.path.slice(0, 300), requestHash } };
}

/** Sends a write's answer; a replayed one says so, so the outbox can tell it was done before. */
export function sendWrite(res: Response, result: WriteResult<unknown>): void {
  if (result.isReplay) res.set('Idempotent-Replay', 'true');
  res.status(result.status).json(result.body);
}
