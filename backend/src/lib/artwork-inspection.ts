import { fileTypeFromBuffer } from 'file-type';

import type { ArtworkContentType } from '@tracewright/shared';

import { AppError, unprocessable } from '../errors/app-error';
import { inspectPdf } from './pdf-active-content';
import { isSvgDocument, sanitiseSvg } from './svg-sanitiser';

export interface InspectedArtwork {
  contentType: ArtworkContentType;
  extension: 'png' | 'svg' | 'pdf';
  /** What gets stored: the upload itself, or for SVG its sanitised form. */
  bytes: Buffer;
}

const WRONG_TYPE = (found: string) =>
  new AppError(415, 'UNSUPPORTED_MEDIA_TYPE', `Artwork must be a PNG, SVG or PDF file; this one's content is ${found}, whatever its name says. Export the layer as PNG, SVG or PDF.`);

/** IHDR must come first and name a non-empty image (PNG specification §11.2.2). */
function isPlausiblePng(bytes: Buffer): boolean {
  if (bytes.length < 33 || bytes.toString('latin1', 12, 16) !== 'IHDR') return false;
  return bytes.readUInt32BE(16) > 0 && bytes.readUInt32BE(20) > 0;
}

function svgText(bytes: Buffer): string | null {
  try {
    // Fatal: text that is not UTF-8 is not an SVG we can check.
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    return null;
  }
}

/**
 * Decides the type from the bytes, never from the name or the browser's claim: PNG and PDF by
 * their signatures, SVG by parsing. SVG comes back sanitised; a PDF that would run scripts is refused.
 */
export async function inspectArtwork(bytes: Buffer): Promise<InspectedArtwork> {
  const sniffed = await fileTypeFromBuffer(bytes);
  if (sniffed?.mime === 'image/png') {
    if (!isPlausiblePng(bytes)) throw unprocessable('This PNG is damaged (its header is not valid). Export it again.');
    return { contentType: 'image/png', extension: 'png', bytes };
  }
  if (sniffed?.mime === 'application/pdf') {
    const verdict = inspectPdf(bytes);
    if (!verdict.ok) throw unprocessable(`This PDF was refused: ${verdict.reason}. Export the artwork again without scripts or protection, or as SVG or PNG.`);
    return { contentType: 'application/pdf', extension: 'pdf', bytes };
  }
  // SVG is text: file-type calls it XML at best, so anything else it recognised is not artwork.
  if (sniffed && sniffed.mime !== 'application/xml') throw WRONG_TYPE(`${sniffed.ext.toUpperCase()} (${sniffed.mime})`);
  const text = svgText(bytes);
  if (text === null || !isSvgDocument(text)) throw WRONG_TYPE(sniffed ? 'XML that is not an SVG drawing' : 'not a recognised file type');
  return { contentType: 'image/svg+xml', extension: 'svg', bytes: Buffer.from(sanitiseSvg(text), 'utf8') };
}

// Bidirectional overrides can make "gpj.exe" look like "exe.jpg"; control characters break headers.
// eslint-disable-next-line no-control-regex -- control characters are exactly what this removes
const UNSAFE_CHARACTERS = /[\u0000-\u001f\u007f\u200e\u200f\u202a-\u202e\u2066-\u2069"<>:|?*\\/]/g;

/**
 * A name to show and to offer on download: the client's base name without paths, control or
 * direction characters, at most 120 characters, ending in the extension the content has.
 *
 * @example safeDisplayName('C:\\fakepath\\..\\key\u202Egnp.exe', 'png') // → 'keygnp.exe.png'
 */
export function safeDisplayName(original: string | undefined, extension: string): string {
  const base = (original ?? '').split(/[\\/]/).pop() ?? '';
  const cleaned = base.normalize('NFC').replace(UNSAFE_CHARACTERS, '').replace(/\s+/g, ' ').trim().replace(/^\.+/, '');
  const stem = cleaned.toLowerCase().endsWith(`.${extension}`) ? cleaned.slice(0, -(extension.length + 1)) : cleaned;
  const short = stem.slice(0, 120 - extension.length - 1).trim();
  return `${short || 'artwork'}.${extension}`;
}
