import { useEffect, useRef, useState } from 'react';

import { createFrameReader } from '../utils/frame-reader';

type QrScannerProps = { label: string; onResult: (text: string) => void };

const LOOK_EVERY_MS = 250;

function cameraProblem(error: unknown): string {
  const name = error instanceof DOMException ? error.name : '';
  if (name === 'NotAllowedError') return 'The camera was not allowed. Allow it for this site in the browser settings, or type the code below.';
  if (name === 'NotFoundError') return 'This tablet has no camera we can use. Type the code below.';
  return 'The camera could not start. Type the code below.';
}

/** The back camera, looking for a QR code a few times a second until it finds one. */
export function QrScanner({ label, onResult }: QrScannerProps) {
  const videoRef = useRef<HTMLVideoElement>(null);
  const resultRef = useRef(onResult);
  const [problem, setProblem] = useState<string | null>(null);

  useEffect(() => {
    resultRef.current = onResult;
  }, [onResult]);

  useEffect(() => {
    let stream: MediaStream | null = null;
    let timer: ReturnType<typeof setTimeout> | null = null;
    let isLive = true;
    const start = async () => {
      if (!navigator.mediaDevices?.getUserMedia) return setProblem('This browser gives no camera here (it needs https). Type the code below.');
      try {
        stream = await navigator.mediaDevices.getUserMedia({ video: { facingMode: 'environment' }, audio: false });
        const video = videoRef.current;
        if (!isLive || !video) return stream.getTracks().forEach((track) => track.stop());
        video.srcObject = stream;
        await video.play();
        const read = await createFrameReader();
        const look = async () => {
          if (!isLive) return;
          const text = await read(video).catch(() => null);
          if (text && isLive) return resultRef.current(text);
          timer = setTimeout(() => void look(), LOOK_EVERY_MS);
        };
        void look();
      } catch (error) {
        if (isLive) setProblem(cameraProblem(error));
      }
    };
    void start();
    return () => {
      isLive = false;
      if (timer) clearTimeout(timer);
      stream?.getTracks().forEach((track) => track.stop());
    };
  }, []);

  if (problem) return <p role="status" className="rounded-lg border-2 border-graphite-500 bg-white p-4">{problem}</p>;
  return (
    <div className="flex flex-col gap-2">
      <video ref={videoRef} muted playsInline aria-label={label} className="aspect-[4/3] w-full max-w-xl rounded-xl border-2 border-graphite-700 bg-graphite-900 object-cover" />
      <p className="text-graphite-700">Hold the code inside the picture, about a hand’s width away.</p>
    </div>
  );
}
