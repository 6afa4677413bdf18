// The worker is a file of its own that Vite copies and names; pdf.js is told where it lives.
import pdfWorkerUrl from 'pdfjs-dist/build/pdf.worker.min.mjs?url';
import { useEffect, useRef, useState } from 'react';

type PdfThumbnailProps = { blob: Blob; label: string; sizePx: number };

/** The first page of a PDF, drawn into a canvas. pdf.js loads only when a PDF is shown. */
export function PdfThumbnail({ blob, label, sizePx }: PdfThumbnailProps) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const [failed, setFailed] = useState(false);

  useEffect(() => {
    let cancelled = false;
    let cancelRender = () => {};
    async function draw() {
      const pdfjs = await import('pdfjs-dist');
      pdfjs.GlobalWorkerOptions.workerSrc = pdfWorkerUrl;
      const doc = await pdfjs.getDocument({ data: new Uint8Array(await blob.arrayBuffer()) }).promise;
      try {
        const page = await doc.getPage(1);
        const canvas = canvasRef.current;
        if (cancelled || !canvas) return;
        const natural = page.getViewport({ scale: 1 });
        const scale = (sizePx / Math.max(natural.width, natural.height)) * (window.devicePixelRatio || 1);
        const viewport = page.getViewport({ scale });
        canvas.width = Math.ceil(viewport.width);
        canvas.height = Math.ceil(viewport.height);
        const task = page.render({ canvas, viewport });
        cancelRender = () => task.cancel();
        await task.promise;
      } finally {
        await doc.destroy();
      }
    }
    draw().catch(() => {
      if (!cancelled) setFailed(true);
    });
    return () => {
      cancelled = true;
      cancelRender();
    };
  }, [blob, sizePx]);

  if (failed) return <span className="text-sm text-graphite-600">PDF preview not available</span>;
  return <canvas ref={canvasRef} role="img" aria-label={label} style={{ maxWidth: sizePx, maxHeight: sizePx }} className="rounded border border-graphite-200 bg-white" />;
}
