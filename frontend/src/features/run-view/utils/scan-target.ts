const RUN_VIEW_PATH = /^\/run\/[^/?#]+\/?$/;
const RUN_CODE = /^R-\d{4}-\d{4,}$/i;

export type ScanTarget = { type: 'path'; path: string } | { type: 'run-code'; code: string } | { type: 'unknown'; text: string };

/**
 * Where a scanned (or typed) code leads. A link into this app opens its path; a traveller link
 * printed under another address of the same lab (an IP, a new host name) still opens its run
 * page, because only the path is used and the page checks the session and the run itself. A
 * bare run code is looked up. Anything else is refused rather than followed.
 * @example scanTarget('https://lab.example/run/7', 'https://lab.example') // → { type: 'path', path: '/run/7' }
 * @example scanTarget('R-2026-0007', 'https://lab.example') // → { type: 'run-code', code: 'R-2026-0007' }
 */
export function scanTarget(text: string, origin: string): ScanTarget {
  const trimmed = text.trim();
  if (RUN_CODE.test(trimmed)) return { type: 'run-code', code: trimmed.toUpperCase() };
  if (/^\d+$/.test(trimmed)) return { type: 'path', path: `/run/${trimmed}` };
  const isPath = trimmed.startsWith('/') && !trimmed.startsWith('//') && !trimmed.startsWith('/\\');
  let url: URL;
  try {
    url = isPath ? new URL(trimmed, origin) : new URL(trimmed);
  } catch {
    return { type: 'unknown', text: trimmed };
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') return { type: 'unknown', text: trimmed };
  const path = `${url.pathname}${url.search}${url.hash}`;
  if (url.origin === origin) return { type: 'path', path };
  if (RUN_VIEW_PATH.test(url.pathname)) return { type: 'path', path: url.pathname.replace(/\/$/, '') };
  return { type: 'unknown', text: trimmed };
}
