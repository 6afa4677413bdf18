import { z } from 'zod';

/** Artwork a print pass may point at: checked by content, never by the name or the browser's word. */
export const ARTWORK_CONTENT_TYPES = ['image/png', 'image/svg+xml', 'application/pdf'] as const;
export const ArtworkContentTypeSchema = z.enum(ARTWORK_CONTENT_TYPES);
export type ArtworkContentType = z.infer<typeof ArtworkContentTypeSchema>;

/** 10 MiB: a print layer at bench-printer resolution fits well inside it. */
export const ARTWORK_MAX_BYTES = 10 * 1024 * 1024;

/** A stored file as the API answers after an upload; read its bytes at GET /api/files/:id. */
export const StoredFileSchema = z.object({
  id: z.number().int(),
  contentType: z.string(),
  sizeBytes: z.number().int(),
  displayName: z.string(),
});
export type StoredFile = z.infer<typeof StoredFileSchema>;
