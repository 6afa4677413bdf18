type Detector = { detect: (source: CanvasImageSource) => Promise<{ rawValue: string }[]> };
type DetectorCtor = new (options: { formats: string[] }) => Detector;

/** Reads one frame of the camera: the browser's own QR detector where there is one, else jsQR on the pixels. */
export type FrameReader = (video: HTMLVideoElement) => Promise<string | null>;

export async function createFrameReader(): Promise<FrameReader> {
  const Native = (window as Window & { BarcodeDetector?: DetectorCtor }).BarcodeDetector;
  if (Native) {
    const detector = new Native({ formats: ['qr_code'] });
    return async (video) => (await detector.detect(video))[0]?.rawValue ?? null;
  }
  // jsQR is only fetched on tablets whose browser cannot read QR codes itself.
  const { decodeQr } = await import('./qr-decode');
  const canvas = document.createElement('canvas');
  const context = canvas.getContext('2d', { willReadFrequently: true });
  return async (video) => {
    if (!context || video.videoWidth === 0) return null;
    // Half size is plenty for a traveller's code and keeps each pass quick on a tablet.
    canvas.width = Math.round(video.videoWidth / 2);
    canvas.height = Math.round(video.videoHeight / 2);
    context.drawImage(video, 0, 0, canvas.width, canvas.height);
    return decodeQr(context.getImageData(0, 0, canvas.width, canvas.height));
  };
}
