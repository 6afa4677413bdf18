import type { Connection } from 'mariadb';

import type { DraftContent } from '@tracewright/shared';

import { findRow } from '../db/direct-rows';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { versionContent } from './recipe-dto';

/** Versions kept; a lab runs a few dozen recipes at a time, so this is never the limit in practice. */
const MAX_VERSIONS = 500;
const parsed = new Map<string, DraftContent>();

function deepFreeze<T>(value: T): T {
  if (typeof value === 'object' && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const inner of Object.values(value)) deepFreeze(inner);
  }
  return value;
}

/**
 * A version's content for a tablet write. Every write needs its run's steps, and reading and
 * parsing the version's JSON each time cost more than the write's other reads together. Kept by
 * id, content hash and last change, read fresh on every call (a tiny row), so a changed version is
 * never served stale. Entries are frozen because callers share them: a change throws at once.
 * `of` is the version's id or its run's. Null when there is no such version.
 */
export async function cachedVersionContent(connection: Connection, of: number | { runId: number }): Promise<DraftContent | null> {
  const [stamp] = (await (typeof of === 'number'
    ? connection.query('SELECT id, content_hash, updated_at FROM recipe_versions WHERE id = ?', [of])
    : connection.query('SELECT v.id, v.content_hash, v.updated_at FROM recipe_versions v JOIN runs r ON r.version_id = v.id WHERE r.id = ?', [of.runId]))) as Array<{
    id: number;
    content_hash: string;
    updated_at: Date | null;
  }>;
  if (!stamp) return null;
  const key = `${stamp.id}:${stamp.content_hash}:${stamp.updated_at?.getTime() ?? ''}`;
  const known = parsed.get(key);
  if (known) return known;
  const version = await findRow(RecipeVersionModel, connection, { id: stamp.id });
  if (!version) return null;
  const content = deepFreeze(versionContent(version));
  if (parsed.size >= MAX_VERSIONS) parsed.delete(parsed.keys().next().value as string);
  parsed.set(key, content);
  return content;
}
