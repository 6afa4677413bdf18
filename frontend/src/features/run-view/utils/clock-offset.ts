/**
 * How far the server's clock is ahead of the tablet's, in ms, from one request: the server read
 * its clock about halfway through the round trip.
 * @example clockOffsetMs('2026-12-02T10:00:30.000Z', Date.parse('2026-12-02T10:00:00.000Z'), Date.parse('2026-12-02T10:00:00.200Z')) // → 29_900
 */
export function clockOffsetMs(serverTime: string, requestedAtMs: number, receivedAtMs: number): number {
  const server = Date.parse(serverTime);
  if (Number.isNaN(server)) return 0;
  return Math.round(server - (requestedAtMs + receivedAtMs) / 2);
}
