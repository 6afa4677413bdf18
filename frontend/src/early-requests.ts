/**
 * The first GETs of a run view, sent before the rest of the app's code has run: main.tsx imports
 * this file first. On a tablet about four times slower than a desktop, evaluating the app takes
 * about half a second, and the session and the run travel meanwhile instead of after it
 * (`npm run bench -- --only=paint`). The API client takes these answers (`takeEarlyGet`) instead of
 * asking again. (As an entry of its own, named first in index.html, it ran earlier on a first
 * visit but its requests then shared the slow link with the app's code, and the page drew later.)
 */

const EARLY = '__tracewrightEarlyGets';
/** An early answer older than this is not used: the app asks afresh. */
const FRESH_MS = 10_000;

type EarlyGet = { response: Promise<Response>; at: number };
type EarlyWindow = Window & { [EARLY]?: Map<string, EarlyGet> };

function startEarlyGet(path: string): void {
  const gets = ((window as EarlyWindow)[EARLY] ??= new Map());
  const response = fetch(new URL(path, window.location.origin), { headers: { Accept: 'application/json' }, credentials: 'same-origin' });
  // Taken by the app, which handles a failure as its own; until then it must not count as unhandled.
  response.catch(() => undefined);
  gets.set(path, { response, at: Date.now() });
}

/** The early answer for a GET of `path`, once and while fresh; otherwise undefined (ask as usual). */
export function takeEarlyGet(path: string): Promise<Response> | undefined {
  const gets = (window as EarlyWindow)[EARLY];
  const early = gets?.get(path);
  if (!early) return undefined;
  gets?.delete(path);
  return Date.now() - early.at <= FRESH_MS ? early.response : undefined;
}

// Same pattern as the run view's route (features/run-view/run-view-routes.tsx), which this file may not import.
const run = /^\/run\/([1-9][0-9]*)\/?$/.exec(window.location.pathname);
if (run && !(window as EarlyWindow)[EARLY]) {
  startEarlyGet('/api/auth/session');
  startEarlyGet(`/api/runs/${run[1]}`);
  // The step's title and text are set in these faces: fetched now, not once the page has laid them out.
  for (const face of ['700 1em "Atkinson Hyperlegible"', '400 1em "Atkinson Hyperlegible"']) void document.fonts?.load(face).catch(() => undefined);
}
