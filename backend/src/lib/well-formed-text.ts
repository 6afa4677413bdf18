import type { RequestHandler } from 'express';

import { badRequest } from '../errors/app-error';

/**
 * A lone UTF-16 surrogate ("\ud800") is valid JSON but not text: the database refuses it as an
 * incorrect string value. Such a string can only come from a broken client or a crafted request.
 * @example hasLoneSurrogate('a\ud800b') // → true
 */
export function hasLoneSurrogate(text: string): boolean {
  // Unpaired high surrogate, or a low surrogate without its high half.
  return /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/.test(text);
}

function firstBrokenText(value: unknown): boolean {
  const pending: unknown[] = [value];
  while (pending.length > 0) {
    const node = pending.pop();
    if (typeof node === 'string') {
      if (hasLoneSurrogate(node)) return true;
    } else if (typeof node === 'object' && node !== null) {
      for (const [key, child] of Object.entries(node)) {
        if (hasLoneSurrogate(key)) return true;
        pending.push(child);
      }
    }
  }
  return false;
}

/** Refuses bodies and queries holding broken text with a 400 before any handler stores it. */
export const refuseBrokenText: RequestHandler = (req, _res, next) => {
  if (firstBrokenText(req.body) || firstBrokenText(req.query)) {
    throw badRequest('Some text in the request holds a broken character (an unpaired UTF-16 surrogate). Retype the text and send it again.');
  }
  next();
};
