/** The service worker's cache of GET /api/auth/session (runtime caching in vite.config.ts). */
const SESSION_CACHE = 'tw-session';

/**
 * Asks for the session once more through the service worker, so its cache holds the person now
 * signed in. A sign-in or PIN switch answers with the session itself and the page that was open
 * before the worker took control never asked through it: without this, a reload with no network
 * on the tablet would not know who is signed in, or would find the person before.
 */
export function cacheSessionForOffline(): void {
  if (typeof navigator === 'undefined' || !navigator.serviceWorker?.controller) return;
  // Best effort by design: with no network it fails, and the next load or sign-in asks again.
  fetch('/api/auth/session', { credentials: 'same-origin' }).catch(() => undefined);
}

/** After a sign-out, a reload with no network must not open as the person who left. */
export async function forgetOfflineSession(): Promise<void> {
  if (typeof caches === 'undefined') return;
  await caches.delete(SESSION_CACHE);
}
