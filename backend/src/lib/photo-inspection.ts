import { fileTypeFromBuffer } from 'file-type';

import type { PhotoContentType } from '@tracewright/shared';

import { AppError } from '../errors/app-error';

export interface InspectedPhoto {
  contentType: PhotoContentType;
  extension: 'jpg' | 'png' | 'webp';
}

const EXTENSIONS: Record<PhotoContentType, InspectedPhoto['extension']> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
};

const isPhotoType = (mime: string): mime is PhotoContentType => Object.hasOwn(EXTENSIONS, mime);

/**
 * Decides a photo's type from its bytes, never from its name or the browser's claim: JPEG, PNG
 * or WebP by their signatures. Anything else (HEIC included: browsers cannot show it) is refused.
 */
export async function inspectPhoto(bytes: Buffer): Promise<InspectedPhoto> {
  const sniffed = await fileTypeFromBuffer(bytes);
  if (sniffed && isPhotoType(sniffed.mime)) return { contentType: sniffed.mime, extension: EXTENSIONS[sniffed.mime] };
  const found = sniffed ? `${sniffed.ext.toUpperCase()} (${sniffed.mime})` : 'not a recognised image';
  throw new AppError(415, 'UNSUPPORTED_MEDIA_TYPE', `Photos must be JPEG, PNG or WebP; this file's content is ${found}, whatever its name says. Take the photo with the tablet's camera, or save it as JPEG.`);
}
