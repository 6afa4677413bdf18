import { createHash } from 'node:crypto';

import type { Response } from 'express';

import { IdParamsSchema, PERMISSIONS } from '@tracewright/shared';
import { ARTWORK_MAX_BYTES, type StoredFile } from '@tracewright/shared';
import { PHOTO_MAX_BYTES } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { readSingleFile } from '../lib/upload-parser';
import { currentUser } from '../middleware/authenticate';
import { sendWrite, tabletWrite } from '../middleware/idempotency';
import { readStoredFile, uploadArtwork, uploadPhoto } from '../services/stored-file.service';
import { route, type RouteSpec } from './route-table';

/** Types a browser may show in place; anything else (PDF) is offered as a download. */
const SHOWN_INLINE = new Set(['image/png', 'image/svg+xml', 'image/jpeg', 'image/webp']);

/**
 * Headers that keep a stored file inert: no sniffing, and a sandbox CSP so an SVG opened on its
 * own can neither run script nor load anything (only its inline styles apply).
 */
function sendStoredFile(res: Response, file: StoredFile, bytes: Buffer) {
  res.set({
    'X-Content-Type-Options': 'nosniff',
    'Content-Security-Policy': "sandbox; default-src 'none'; style-src 'unsafe-inline'",
    'Cache-Control': 'private, max-age=3600',
  });
  if (!SHOWN_INLINE.has(file.contentType)) res.attachment(file.displayName);
  res.type(file.contentType).send(bytes);
}

export function fileRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('post', '/api/files/artwork', PERMISSIONS.authorRecipes, async (req, res) => {
      const file = await readSingleFile(req, res, 'file', ARTWORK_MAX_BYTES);
      res.status(201).json(await uploadArtwork(ctx, currentUser(req), file));
    }),
    route('post', '/api/files/photos', PERMISSIONS.workRuns, async (req, res) => {
      const file = await readSingleFile(req, res, 'file', PHOTO_MAX_BYTES, 'Take it again at a lower resolution, or send it as JPEG.');
      // The bytes are what make a retried upload the same one (multipart framing differs per attempt).
      const fingerprint = file ? createHash('sha256').update(file.buffer).digest('hex') : null;
      sendWrite(res, await uploadPhoto(ctx, tabletWrite(req, fingerprint), file));
    }),
    route('get', '/api/files/:id', 'signed-in', async (req, res) => {
      const { file, bytes } = await readStoredFile(ctx, IdParamsSchema.parse(req.params).id);
      sendStoredFile(res, file, bytes);
    }),
  ];
}
