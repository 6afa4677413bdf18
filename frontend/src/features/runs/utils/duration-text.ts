/**
 * A length of time as a bench reads it: seconds under a minute, else minutes, hours past an hour.
 * @example durationText(45) // → '45 s'; durationText(900) // → '15 min'; durationText(3930) // → '1 h 05 min'
 */
export function durationText(totalSeconds: number): string {
  const seconds = Math.max(0, Math.round(totalSeconds));
  if (seconds < 60) return `${seconds} s`;
  const minutes = Math.floor(seconds / 60);
  const rest = seconds % 60;
  if (minutes < 60) return rest === 0 ? `${minutes} min` : `${minutes} min ${String(rest).padStart(2, '0')} s`;
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}
