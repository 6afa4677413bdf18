import { useEffect } from 'react';

/**
 * Keeps the screen on while `isWanted` (a timer runs). The browser drops the lock whenever the
 * page is hidden, so it is asked for again each time the page comes back.
 */
export function useWakeLock(isWanted: boolean): void {
  useEffect(() => {
    if (!isWanted || !('wakeLock' in navigator)) return;
    let sentinel: WakeLockSentinel | null = null;
    let isActive = true;
    const request = async () => {
      if (document.visibilityState !== 'visible' || sentinel) return;
      try {
        const lock = await navigator.wakeLock.request('screen');
        if (!isActive) return void lock.release();
        sentinel = lock;
        lock.addEventListener('release', () => {
          sentinel = null;
        });
      } catch {
        // Refused (battery saver, not allowed): the timer still rings, the screen may just dim.
      }
    };
    const onVisible = () => void request();
    void request();
    document.addEventListener('visibilitychange', onVisible);
    return () => {
      isActive = false;
      document.removeEventListener('visibilitychange', onVisible);
      void sentinel?.release();
    };
  }, [isWanted]);
}
