const ALPHABET = 'abcdefghijklmnopqrstuvwxyz0123456789';

/**
 * A fresh id for a step or reading spec: a short prefix and 10 random characters, well inside the
 * 6–40 characters of [A-Za-z0-9_-] the schema allows. Ids stay put across edits and versions, so
 * the diff can tell a moved step from a new one.
 */
export function newId(prefix: string): string {
  const bytes = crypto.getRandomValues(new Uint8Array(10));
  const tail = Array.from(bytes, (b) => ALPHABET[b % ALPHABET.length]).join('');
  return `${prefix}-${tail}`;
}
