/**
 * JSON text with object keys in sorted order at every depth, so equal content always hashes the
 * same whatever order its keys were built in. Follows JSON.stringify otherwise: undefined and
 * functions drop out of objects and become null in arrays, NaN and ±Infinity become null,
 * toJSON() is honoured, bigint throws. Array order is kept: in a recipe it means something.
 *
 * @example
 * canonicalJson({ b: 1, a: { d: [3, undefined], c: 'x' } }) // → '{"a":{"c":"x","d":[3,null]},"b":1}'
 */
export function canonicalJson(value: unknown): string {
  return encode(value) ?? 'null';
}

function encode(value: unknown): string | undefined {
  if (value !== null && typeof value === 'object' && typeof (value as { toJSON?: unknown }).toJSON === 'function') {
    return encode((value as { toJSON: () => unknown }).toJSON());
  }
  if (value === null || typeof value !== 'object') return JSON.stringify(value);
  if (Array.isArray(value)) return `[${value.map((item) => encode(item) ?? 'null').join(',')}]`;
  const record = value as Record<string, unknown>;
  const members: string[] = [];
  for (const key of Object.keys(record).sort()) {
    const encoded = encode(record[key]);
    if (encoded !== undefined) members.push(`${JSON.stringify(key)}:${encoded}`);
  }
  return `{${members.join(',')}}`;
}
