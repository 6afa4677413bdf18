import type { Sequelize } from 'sequelize';

/** A small seeded generator (mulberry32), so every bench run seeds the same data. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

export const pick = <T>(random: () => number, items: readonly T[]): T => items[Math.floor(random() * items.length)] as T;

/** Picks by weight, e.g. weighted(r, [['minor', 6], ['major', 3]]). */
export function weighted<T>(random: () => number, choices: ReadonlyArray<readonly [T, number]>): T {
  const total = choices.reduce((sum, [, w]) => sum + w, 0);
  let roll = random() * total;
  for (const [value, weight] of choices) {
    roll -= weight;
    if (roll < 0) return value;
  }
  return (choices.at(-1) as readonly [T, number])[0];
}

/**
 * Multi-row INSERTs through the app's own connection pool, `perStatement` rows each: one round
 * trip and one commit per statement instead of per row, as a lab's import would do.
 */
export async function insertRows(sequelize: Sequelize, table: string, columns: readonly string[], rows: readonly unknown[][], perStatement = 1_000): Promise<void> {
  const tuple = `(${columns.map(() => '?').join(', ')})`;
  for (let start = 0; start < rows.length; start += perStatement) {
    const chunk = rows.slice(start, start + perStatement);
    const sql = `INSERT INTO ${table} (${columns.join(', ')}) VALUES ${chunk.map(() => tuple).join(', ')}`;
    await sequelize.query(sql, { replacements: chunk.flat() });
  }
}
