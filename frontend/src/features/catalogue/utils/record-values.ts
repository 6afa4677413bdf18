/** A saved record as form values: the fields a person edits, without id, version and bookkeeping. */
export function formValuesOf<T extends { id: number; version: number; archived: boolean; updatedAt: string }>(
  record: T,
): Omit<T, 'id' | 'version' | 'archived' | 'updatedAt'> {
  const { id: _id, version: _version, archived: _archived, updatedAt: _updatedAt, ...values } = record;
  return values;
}
