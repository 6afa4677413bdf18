/**
 * Below this many points the indices are shown as provisional: a common rule of thumb for
 * individuals data, no source. The library computes from 2 points up; this only words the result.
 */
export const PROVISIONAL_BELOW_POINTS = 20;

/** @example isProvisional(10) // → true; isProvisional(20) // → false */
export function isProvisional(pointCount: number): boolean {
  return pointCount < PROVISIONAL_BELOW_POINTS;
}
