const pad = (n: number) => String(n).padStart(2, '0');

/**
 * Remaining time as a bench clock: m:ss under an hour, h:mm:ss above; past zero it counts up.
 * @example timerText(125) // → '2:05'; timerText(-75) // → '1:15'; timerText(3725) // → '1:02:05'
 */
export function timerText(seconds: number): string {
  const total = Math.abs(Math.trunc(seconds));
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  return h > 0 ? `${h}:${pad(m)}:${pad(s)}` : `${m}:${pad(s)}`;
}

/**
 * The same in words, for screen readers and the live region.
 * @example timerWords(125) // → '2 min 5 s'
 */
export function timerWords(seconds: number): string {
  const total = Math.abs(Math.trunc(seconds));
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  return [h ? `${h} h` : '', m ? `${m} min` : '', s || total === 0 ? `${s} s` : ''].filter(Boolean).join(' ');
}
