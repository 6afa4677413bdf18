/** A channel this close to white counts as paper, not ink (anti-aliasing leaves near-whites). */
const WHITE_FROM = 250;
/** Pixels more transparent than this are background. */
const OPAQUE_FROM = 16;

/**
 * Fraction of an artwork's pixels that carry ink: neither (nearly) transparent nor (nearly)
 * white. Reads RGBA bytes as a canvas gives them.
 *
 * @example
 * // two pixels: opaque black, transparent → 0.5
 * printedFraction(new Uint8ClampedArray([0, 0, 0, 255, 0, 0, 0, 0])) // → 0.5
 */
export function printedFraction(rgba: Uint8ClampedArray): number {
  const pixels = Math.floor(rgba.length / 4);
  if (pixels === 0) return 0;
  let inked = 0;
  for (let i = 0; i < pixels * 4; i += 4) {
    const a = rgba[i + 3] as number;
    if (a < OPAQUE_FROM) continue;
    const isWhite = (rgba[i] as number) >= WHITE_FROM && (rgba[i + 1] as number) >= WHITE_FROM && (rgba[i + 2] as number) >= WHITE_FROM;
    if (!isWhite) inked += 1;
  }
  return inked / pixels;
}

/** Longest side the artwork is scaled to before counting: plenty for a fraction, quick on a tablet. */
const MAX_SIDE = 1024;

/** Draws a PNG or SVG file to an off-screen canvas and counts its inked pixels. */
export async function measurePrintedFraction(file: Blob): Promise<number> {
  const url = URL.createObjectURL(file);
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const width = image.naturalWidth || MAX_SIDE;
    const height = image.naturalHeight || MAX_SIDE;
    const scale = Math.min(1, MAX_SIDE / Math.max(width, height));
    const canvas = document.createElement('canvas');
    canvas.width = Math.max(1, Math.round(width * scale));
    canvas.height = Math.max(1, Math.round(height * scale));
    const context = canvas.getContext('2d');
    if (!context) throw new Error('This browser cannot draw the artwork to count it.');
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    return printedFraction(context.getImageData(0, 0, canvas.width, canvas.height).data);
  } finally {
    URL.revokeObjectURL(url);
  }
}
