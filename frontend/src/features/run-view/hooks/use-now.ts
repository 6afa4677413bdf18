import { useEffect, useState } from 'react';

/** The tablet's clock (ms), ticking every `intervalMs`: timers redraw from it. */
export function useNow(intervalMs = 1_000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const id = setInterval(() => setNow(Date.now()), intervalMs);
    return () => clearInterval(id);
  }, [intervalMs]);
  return now;
}
