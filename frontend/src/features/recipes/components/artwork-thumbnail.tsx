import { useEffect, useState } from 'react';

import { useFileBlob } from '../api/get-file-blob';
import { PdfThumbnail } from './pdf-thumbnail';

type ArtworkThumbnailProps = { fileId: number; label: string; sizePx?: number };

function BlobImage({ blob, label, sizePx }: { blob: Blob; label: string; sizePx: number }) {
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    const made = URL.createObjectURL(blob);
    setUrl(made);
    return () => URL.revokeObjectURL(made);
  }, [blob]);
  if (!url) return null;
  return <img src={url} alt={label} style={{ maxWidth: sizePx, maxHeight: sizePx }} className="rounded border border-graphite-200 bg-white object-contain" />;
}

/** A print layer's artwork, small: PNG and SVG as images, a PDF's first page drawn by pdf.js. */
export function ArtworkThumbnail({ fileId, label, sizePx = 64 }: ArtworkThumbnailProps) {
  const { data: blob, isError } = useFileBlob(fileId);
  if (isError) return <span className="text-sm text-graphite-600">Artwork not available</span>;
  if (!blob) return <span className="inline-block rounded border border-graphite-200 bg-graphite-50" style={{ width: sizePx, height: sizePx }} aria-hidden="true" />;
  if (blob.type === 'application/pdf') return <PdfThumbnail blob={blob} label={label} sizePx={sizePx} />;
  return <BlobImage blob={blob} label={label} sizePx={sizePx} />;
}
