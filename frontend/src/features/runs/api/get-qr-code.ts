import { queryOptions } from '@tanstack/react-query';
import QRCode from 'qrcode';

import { runKeys } from './run-keys';

/**
 * A QR code as a PNG data URL, black on white with the standard four-module quiet zone. Drawn
 * at 8 px a module so it prints crisp at label and traveller sizes; medium error correction
 * survives a smudge or a crease.
 */
export function makeQrCode(text: string): Promise<string> {
  return QRCode.toDataURL(text, { errorCorrectionLevel: 'M', margin: 4, scale: 8, color: { dark: '#000000', light: '#ffffff' } });
}

// Drawn once per text: the same address always gives the same picture.
export const qrCodeQueryOptions = (text: string) =>
  queryOptions({ queryKey: runKeys.qr(text), queryFn: () => makeQrCode(text), staleTime: Infinity, gcTime: 10 * 60_000 });
