const round = (n: number, digits = 1) => Number(n.toFixed(digits));

/**
 * Minutes as a bench reads them: seconds under a minute, minutes under two hours, then h and min.
 * @example formatMinutes(0.25) // → '15 s'; formatMinutes(56) // → '56 min'; formatMinutes(135) // → '2 h 15 min'
 */
export function formatMinutes(minutes: number): string {
  if (minutes === 0) return '0 min';
  if (minutes < 1) return `${Math.round(minutes * 60)} s`;
  if (minutes < 120) return `${round(minutes)} min`;
  const hours = Math.floor(minutes / 60);
  const rest = Math.round(minutes - hours * 60);
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}
