/**
 * The tablet address of one piece: the run's traveller URL with `?piece=<code>`, so a label's QR
 * opens the run at that piece.
 * @example pieceUrl('https://lab.example/run/42', 'R-2026-0042-03') // → 'https://lab.example/run/42?piece=R-2026-0042-03'
 */
export function pieceUrl(travellerUrl: string, pieceCode: string, base = window.location.origin): string {
  // The API sends an absolute address; a relative one is read against this site rather than failing.
  const url = new URL(travellerUrl, base);
  url.searchParams.set('piece', pieceCode);
  return url.toString();
}
