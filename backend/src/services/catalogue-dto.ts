/** The fields every material and equipment record answers with; times as ISO strings. */
export const recordFields = (row: { id: number; version: number; archived: boolean; updatedAt: Date }) => ({
  id: row.id,
  version: row.version,
  archived: Boolean(row.archived),
  updatedAt: row.updatedAt.toISOString(),
});

/** MariaDB keeps JSON as LONGTEXT, so the connector may hand back the text. */
export function parseJsonColumn<T>(value: unknown, fallback: T): T {
  if (typeof value !== 'string') return (value ?? fallback) as T;
  return JSON.parse(value) as T;
}
