import { useState } from 'react';

/**
 * The print pass's artwork from the file store (cached by the service worker, so it shows
 * offline once seen). A file the browser cannot draw as an image (a PDF) gets a link instead.
 */
export function ArtworkPreview({ fileId, title }: { fileId: number; title: string }) {
  const [isBroken, setIsBroken] = useState(false);
  const src = `/api/files/${fileId}`;
  return (
    <figure className="flex flex-col gap-2">
      {isBroken ? (
        <p className="rounded-lg border-2 border-graphite-300 bg-white p-4">
          The artwork can’t be shown here.{' '}
          <a href={src} target="_blank" rel="noreferrer" className="font-bold text-copper-700 underline">
            Open the artwork file
          </a>
        </p>
      ) : (
        <img src={src} alt={`Artwork for ${title}`} onError={() => setIsBroken(true)} className="max-h-[40vh] w-auto self-start rounded-lg border-2 border-graphite-300 bg-white object-contain" />
      )}
      <figcaption className="text-base text-graphite-700">Artwork</figcaption>
    </figure>
  );
}
