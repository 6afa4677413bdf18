/**
 * A deviation's age in whole days, as a queue reads it.
 * @example ageText(0.4) // → 'under 1 day'; ageText(1.2) // → '1 day'; ageText(9) // → '9 days'
 */
export function ageText(ageDays: number): string {
  if (ageDays < 1) return 'under 1 day';
  const days = Math.floor(ageDays);
  return days === 1 ? '1 day' : `${days} days`;
}
