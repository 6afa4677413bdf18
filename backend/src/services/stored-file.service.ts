import { createHash, randomUUID } from 'node:crypto';

import type { StoredFile } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { AppError, badRequest, notFound } from '../errors/app-error';
import { inspectArtwork, safeDisplayName } from '../lib/artwork-inspection';
import { inspectPhoto } from '../lib/photo-inspection';
import { StoredFileModel } from '../models/stored-file.model';
import type { UserModel } from '../models/user.model';
import { recordAudit } from './audit.service';
import { idempotentTransaction, storedAnswer, type TabletWrite, type WriteResult } from './idempotency.service';

const toStoredFileDto = (row: StoredFileModel): StoredFile => ({
  id: row.id,
  contentType: row.contentType,
  sizeBytes: row.sizeBytes,
  displayName: row.displayName,
});

const storageDown = () =>
  new AppError(503, 'SERVICE_UNAVAILABLE', 'File storage is not answering, so nothing was saved. Try again in a minute; if it keeps happening, tell your admin.');

/**
 * Stores print artwork after checking it by content. The object key is ours (a random UUID), so
 * a client's file name never reaches storage; the bytes go first, then the row and its audit in
 * one transaction (a failed insert leaves an unreferenced object, never a row without bytes).
 */
export async function uploadArtwork(ctx: AppContext, actor: UserModel, file: Express.Multer.File | undefined): Promise<StoredFile> {
  if (!file) throw badRequest('Attach the artwork file (form field “file”).');
  if (file.size === 0) throw badRequest('The file is empty (0 bytes). Export the artwork again and attach it.');
  const artwork = await inspectArtwork(file.buffer);
  const storageKey = `artwork/${randomUUID()}.${artwork.extension}`;
  await ctx.storage.put(storageKey, artwork.bytes, artwork.contentType).catch((err: unknown) => {
    ctx.logger.warn({ err: { message: (err as Error).message } }, 'artwork not stored');
    throw storageDown();
  });
  const row = await ctx.sequelize.transaction(async (transaction) => {
    const created = await StoredFileModel.create(
      {
        storageKey,
        displayName: safeDisplayName(file.originalname, artwork.extension),
        contentType: artwork.contentType,
        sizeBytes: artwork.bytes.length,
        sha256: createHash('sha256').update(artwork.bytes).digest('hex'),
        uploadedBy: actor.id,
      },
      { transaction },
    );
    const after = { ...toStoredFileDto(created), storageKey, sha256: created.sha256, sanitised: artwork.bytes !== file.buffer };
    await recordAudit(ctx, { actorId: actor.id, action: 'file.uploaded', entityType: 'file', entityId: created.id, after }, transaction);
    return created;
  });
  return toStoredFileDto(row);
}

/**
 * Stores a photo from the tablet (a problem report, a nozzle check) after checking it by content,
 * like artwork: bytes first under our own key, then the row and its audit in one transaction.
 * A retried upload with the same Idempotency-Key replays the first answer and stores nothing.
 */
export async function uploadPhoto(ctx: AppContext, write: TabletWrite, file: Express.Multer.File | undefined): Promise<WriteResult<StoredFile>> {
  if (!file) throw badRequest('Attach the photo (form field “file”).');
  if (file.size === 0) throw badRequest('The photo is empty (0 bytes). Take it again.');
  const photo = await inspectPhoto(file.buffer);
  // Checked before the bytes go out, so a retry does not leave a second copy in storage.
  const earlier = write.claim ? await storedAnswer<StoredFile>(write.claim) : null;
  if (earlier) return earlier;
  const storageKey = `photos/${randomUUID()}.${photo.extension}`;
  await ctx.storage.put(storageKey, file.buffer, photo.contentType).catch((err: unknown) => {
    ctx.logger.warn({ err: { message: (err as Error).message } }, 'photo not stored');
    throw storageDown();
  });
  return idempotentTransaction(ctx, write.claim, 201, async (transaction) => {
    const created = await StoredFileModel.create(
      {
        storageKey,
        displayName: safeDisplayName(file.originalname, photo.extension),
        contentType: photo.contentType,
        sizeBytes: file.size,
        sha256: createHash('sha256').update(file.buffer).digest('hex'),
        uploadedBy: write.actor.id,
      },
      { transaction },
    );
    const after = { ...toStoredFileDto(created), storageKey, sha256: created.sha256 };
    await recordAudit(ctx, { actorId: write.actor.id, action: 'file.uploaded', entityType: 'file', entityId: created.id, after }, transaction);
    return toStoredFileDto(created);
  });
}

/** A stored file's row and bytes. */
export async function readStoredFile(ctx: AppContext, id: number): Promise<{ file: StoredFile; bytes: Buffer }> {
  const row = await StoredFileModel.findByPk(id);
  if (!row) throw notFound('File', id);
  const bytes = await ctx.storage.get(row.storageKey).catch((err: unknown) => {
    if ((err as { name?: string }).name === 'NoSuchKey') throw notFound('The bytes of file', id);
    ctx.logger.warn({ err: { message: (err as Error).message }, id }, 'stored file not read');
    throw storageDown();
  });
  return { file: toStoredFileDto(row), bytes };
}
