import { createHash } from 'node:crypto';

import type { Connection } from 'mariadb';
import type { Transaction } from 'sequelize';

import { canonicalJson, DraftContentSchema, type DraftContent } from '@tracewright/shared';
import type { PersonRef, RecipeSummary, VersionRef, VersionSummary } from '@tracewright/shared';
import type { Signature } from '@tracewright/shared';

import type { RecipeVersionModel } from '../models/recipe-version.model';
import type { RecipeModel } from '../models/recipe.model';
import type { SignatureModel } from '../models/signature.model';
import { connectionOf, sequelizeOf, withConnection } from '../db/direct-rows';
import { UserModel } from '../models/user.model';
import { parseJsonColumn } from './catalogue-dto';

/** A version with nothing in it yet: what `POST /api/recipes` starts v1 with. */
export const emptyContent = (): DraftContent => DraftContentSchema.parse({ steps: [] });

/** SHA-256 of the canonical JSON: equal content hashes the same whatever its key order. */
export const contentHashOf = (content: DraftContent) => createHash('sha256').update(canonicalJson(content), 'utf8').digest('hex');

/** The stored content, typed; it passed DraftContentSchema when it was saved. */
export const versionContent = (row: RecipeVersionModel): DraftContent => parseJsonColumn<DraftContent>(row.content, emptyContent());

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

/** The recipe as the audit trail keeps it (before/after). */
export const recipeRecord = (row: RecipeModel) => ({
  id: row.id,
  code: row.code,
  name: row.name,
  product: row.product,
  notes: row.notes,
  archived: Boolean(row.archived),
  version: row.version,
});

/** A version as the audit trail keeps it: the whole content, so a draft's history can be replayed. */
export const versionRecord = (row: RecipeVersionModel) => ({
  id: row.id,
  recipeId: row.recipeId,
  number: row.number,
  state: row.state,
  lockVersion: row.lockVersion,
  contentHash: row.contentHash,
  reviewComment: row.reviewComment ?? null,
  content: versionContent(row),
});

export const versionRef = (row: Pick<RecipeVersionModel, 'id' | 'number' | 'state'>): VersionRef => ({ id: row.id, number: row.number, state: row.state });

/** Names of the people a page mentions, read in one query. */
export async function peopleNames(ids: Array<number | null | undefined>, transaction?: Transaction): Promise<Map<number, string>> {
  const wanted = [...new Set(ids.filter((id): id is number => typeof id === 'number'))];
  if (wanted.length === 0) return new Map();
  const read = async (c: Connection) => (await c.query(`SELECT id, name FROM users WHERE id IN (${wanted.map(() => '?').join(', ')})`, wanted)) as Array<{ id: number; name: string }>;
  // On every tablet write's answer: a direct read (db/direct-rows).
  const users = transaction ? await read(connectionOf(transaction)) : await withConnection(sequelizeOf(UserModel), read);
  return new Map(users.map((u) => [Number(u.id), u.name]));
}

export const personRef = (people: Map<number, string>, id: number | null | undefined): PersonRef | null =>
  typeof id === 'number' ? { id, name: people.get(id) ?? `Person #${id}` } : null;

/** Latest version by number (any state) and the released one, from a recipe's versions. */
export function recipeSummary(row: RecipeModel, versions: readonly RecipeVersionModel[]): RecipeSummary {
  const latest = versions.reduce<RecipeVersionModel | null>((best, v) => (!best || v.number > best.number ? v : best), null);
  const released = versions.find((v) => v.state === 'released') ?? null;
  return {
    ...recipeRecord(row),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    latestVersion: latest ? versionRef(latest) : null,
    releasedVersion: released ? versionRef(released) : null,
  };
}

export function versionSummary(row: RecipeVersionModel, people: Map<number, string>): VersionSummary {
  return {
    ...versionRef(row),
    author: personRef(people, row.authorId) as PersonRef,
    changeNote: versionContent(row).changeNote,
    contentHash: row.contentHash,
    submittedAt: iso(row.submittedAt),
    releasedAt: iso(row.releasedAt),
    releasedBy: personRef(people, row.releasedBy),
    retiredAt: iso(row.retiredAt),
    reviewComment: row.reviewComment ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** A recipe version's signature; release is its only signing, so the meaning is release's. */
export const toSignatureDto = (row: SignatureModel): Signature => ({
  id: row.id,
  userId: row.userId,
  printedName: row.printedName,
  meaning: row.meaning as Signature['meaning'],
  signedAt: row.signedAt.toISOString(),
  entityType: row.entityType,
  entityId: row.entityId,
  contentHash: row.contentHash,
});
