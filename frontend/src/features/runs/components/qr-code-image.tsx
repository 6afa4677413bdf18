import { useQuery } from '@tanstack/react-query';

import { qrCodeQueryOptions } from '../api/get-qr-code';

type QrCodeImageProps = { text: string; alt: string; className?: string };

/** A QR code that encodes exactly `text`; square, black on white, sized by the caller. */
export function QrCodeImage({ text, alt, className = 'size-32' }: QrCodeImageProps) {
  const qr = useQuery(qrCodeQueryOptions(text));
  if (qr.isError) return <p className={`${className} border-2 border-dashed border-black p-2 text-sm`}>The QR code could not be drawn. Use the address printed beside it.</p>;
  if (!qr.data) return <span role="status" className={`${className} block border border-dashed border-graphite-400`} aria-label="Drawing the QR code" />;
  return <img src={qr.data} alt={alt} className={`${className} [image-rendering:pixelated]`} />;
}
