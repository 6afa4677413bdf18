import QRCode from 'qrcode';
import { describe, expect, it } from 'vitest';

import { decodeQr, type Pixels } from './qr-decode';
import { scanTarget } from './scan-target';

/** A QR code drawn as camera-like RGBA pixels: `scale` px per module, a 4-module quiet zone. */
function qrPixels(text: string, { scale = 4, invert = false } = {}): Pixels {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const quiet = 4;
  const width = (modules.size + quiet * 2) * scale;
  const data = new Uint8ClampedArray(width * width * 4);
  for (let y = 0; y < width; y++) {
    for (let x = 0; x < width; x++) {
      const row = Math.floor(y / scale) - quiet;
      const col = Math.floor(x / scale) - quiet;
      const isInside = row >= 0 && col >= 0 && row < modules.size && col < modules.size;
      const isDark = isInside && modules.get(row, col) === 1;
      const shade = isDark !== invert ? 20 : 235;
      data.set([shade, shade, shade, 255], (y * width + x) * 4);
    }
  }
  return { data, width, height: width };
}

describe('decodeQr', () => {
  it('when a traveller QR code is in the picture, then its URL comes back and leads to the run page', () => {
    const text = decodeQr(qrPixels('https://lab.example/run/7'));

    expect(text).toBe('https://lab.example/run/7');
    expect(scanTarget(text ?? '', 'https://lab.example')).toEqual({ type: 'path', path: '/run/7' });
  });

  it('when the label is printed light on dark, then it still reads', () => {
    expect(decodeQr(qrPixels('LOT-2026-113', { invert: true }))).toBe('LOT-2026-113');
  });

  it('when there is no code in the picture, then it gives null', () => {
    const width = 64;
    expect(decodeQr({ data: new Uint8ClampedArray(width * width * 4).fill(200), width, height: width })).toBeNull();
  });
});
