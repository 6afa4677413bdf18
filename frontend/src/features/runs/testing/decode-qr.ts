import jsQR from 'jsqr';
import { PNG } from 'pngjs';

/** Reads a PNG data URL back to the text its QR code holds, as a phone's scanner would; null if none. */
export function decodeQrDataUrl(dataUrl: string): string | null {
  const match = /^data:image\/png;base64,(.+)$/.exec(dataUrl);
  if (!match?.[1]) return null;
  const png = PNG.sync.read(Buffer.from(match[1], 'base64'));
  return jsQR(new Uint8ClampedArray(png.data), png.width, png.height)?.data ?? null;
}
