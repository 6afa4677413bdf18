import jsQR from 'jsqr';

export type Pixels = { data: Uint8ClampedArray; width: number; height: number };

/**
 * The text of the QR code in a picture (RGBA pixels, as a canvas gives them), or null. Tries a
 * dark-on-light code first, then an inverted one (labels printed light on dark).
 * @example decodeQr(ctx.getImageData(0, 0, w, h)) // → 'https://lab.example/run/7'
 */
export function decodeQr(pixels: Pixels): string | null {
  const found = jsQR(pixels.data, pixels.width, pixels.height, { inversionAttempts: 'attemptBoth' });
  return found?.data ? found.data : null;
}
