import type { RequestHandler } from 'express';

import { badRequest } from '../errors/app-error';

/** Our deepest real body (a recipe draft: steps → reading specs → fields) is well under this. */
export const MAX_JSON_DEPTH = 32;

/**
 * How deeply a parsed JSON value nests, counted without recursion, so a hostile body of many
 * thousand brackets cannot exhaust the stack here (nor later, in code that walks it recursively).
 *
 * @example jsonDepth({ steps: [{ readingSpecs: [] }] }) // → 4
 */
export function jsonDepth(value: unknown, stopAt = Number.POSITIVE_INFINITY): number {
  let deepest = 0;
  const pending: Array<[unknown, number]> = [[value, 1]];
  while (pending.length > 0) {
    const [node, depth] = pending.pop() as [unknown, number];
    if (typeof node !== 'object' || node === null) continue;
    deepest = Math.max(deepest, depth);
    if (deepest > stopAt) return deepest;
    for (const child of Object.values(node)) pending.push([child, depth + 1]);
  }
  return deepest;
}

/** Refuses JSON bodies nested deeper than any form of ours sends, before a handler sees them. */
export const limitJsonDepth: RequestHandler = (req, _res, next) => {
  if (jsonDepth(req.body, MAX_JSON_DEPTH) > MAX_JSON_DEPTH) {
    throw badRequest(`The request nests deeper than ${MAX_JSON_DEPTH} levels, which no Tracewright form sends. Check the client that built it.`);
  }
  next();
};
