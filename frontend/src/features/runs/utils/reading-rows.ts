import type { ReadingView } from '@tracewright/shared';

/** A reading as it stands, with the values it replaced (oldest first). */
export type ReadingRow = { current: ReadingView; replaced: ReadingView[] };

/**
 * Folds corrections into the reading that stands: a reading whose `supersededById` points at
 * another is shown struck through beside its replacement, never on its own line. Rows keep the
 * order in which each reading was first taken.
 * @example readingRows([{ id: 1, supersededById: 2, … }, { id: 2, supersededById: null, … }]) // → [{ current: #2, replaced: [#1] }]
 */
export function readingRows(readings: readonly ReadingView[]): ReadingRow[] {
  const ids = new Set(readings.map((r) => r.id));
  const replacedBy = new Map<number, ReadingView[]>();
  for (const r of readings) {
    if (r.supersededById !== null && ids.has(r.supersededById)) replacedBy.set(r.supersededById, [...(replacedBy.get(r.supersededById) ?? []), r]);
  }
  const chainOf = (reading: ReadingView, seen: Set<number>): ReadingView[] =>
    (replacedBy.get(reading.id) ?? []).filter((r) => !seen.has(r.id) && seen.add(r.id)).flatMap((r) => [...chainOf(r, seen), r]);
  const rows = readings
    .filter((r) => r.supersededById === null || !ids.has(r.supersededById))
    .map((current) => ({ current, replaced: chainOf(current, new Set([current.id])) }));
  const firstTaken = (row: ReadingRow) => (row.replaced[0] ?? row.current).recordedAt;
  return rows.sort((a, b) => Date.parse(firstTaken(a)) - Date.parse(firstTaken(b)));
}
