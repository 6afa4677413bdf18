import fc from 'fast-check';

/** Stands for a JSON number no JavaScript value serialises to; replaced in the raw text. */
export const OVERFLOW = '__overflow_number__';

/** Ids no row can have, or spellings that are not ids at all. */
export const HOSTILE_IDS = [
  '0',
  '-1',
  '1e3',
  '0x10',
  '1.5',
  '0001',
  ' 1',
  'NaN',
  'Infinity',
  'null',
  '99999999999999999999',
  '2147483648',
  '1;DROP TABLE users',
  "1' OR '1'='1",
  '%00',
  '%2e%2e%2f',
  '..',
  '[object Object]',
];

export const hostileId = (): fc.Arbitrary<string> =>
  fc.oneof(
    fc.constantFrom(...HOSTILE_IDS).map((id) => encodeURIComponent(id)),
    // Well-formed, but beyond any id the test database will reach.
    fc.integer({ min: 2_000_000_000, max: 2_147_483_647 }).map(String),
    // Strings that happen to be plain digits could name another test file's rows: those are left out.
    fc.string({ unit: 'binary', minLength: 1, maxLength: 40 }).filter((s) => !/^[1-9][0-9]*$/.test(s)).map((s) => encodeURIComponent(s)),
  );

/**
 * Numbers for body fields. Small positive whole numbers are left out: as ids they could name
 * rows of other test files sharing the database, and a fuzzed write must only touch its own.
 */
const hostileNumber = (): fc.Arbitrary<number> =>
  fc.oneof(
    fc.integer({ min: -(2 ** 31), max: 0 }),
    fc.integer({ min: 2_000_000_000, max: 2 ** 31 - 1 }),
    fc.double({ noNaN: true, noDefaultInfinity: true }).filter((d) => !(Number.isInteger(d) && d > 0 && d < 2_000_000_000)),
  );

const nested = (depth: number, leaf: unknown): unknown => {
  let value = leaf;
  for (let i = 0; i < depth; i += 1) value = i % 2 ? { a: value } : [value];
  return value;
};

/** One field's worth of trouble: wrong types, edge numbers, huge or odd text, deep nesting. */
export const hostileValue = (): fc.Arbitrary<unknown> =>
  fc.oneof(
    fc.constantFrom(null, true, false, 0, -0, -1, 0.5, 2 ** 31, 2 ** 53 + 2, 1e308, -1e308, Number.MIN_VALUE, OVERFLOW),
    hostileNumber(),
    fc.constantFrom('', '   ', 'NaN', 'Infinity', '-1', '1e3', '0x10', '\u0000', '\u202Eexe.png', '<script>alert(1)</script>', "' OR 1=1 --", '../../etc/passwd', '\ud800'),
    fc.string({ unit: 'binary', maxLength: 60 }),
    // Over every field's limit; up to 120 kB, so the body still fits under the JSON limit.
    fc.integer({ min: 1_000, max: 60_000 }).map((n) => 'é'.repeat(n)),
    fc.array(fc.oneof(hostileNumber(), fc.string(), fc.boolean()), { maxLength: 6 }),
    // Deep enough to hurt a recursive walk; the test's own JSON.stringify must still manage it.
    fc.integer({ min: 50, max: 2_000 }).map((depth) => nested(depth, 1)),
    fc.dictionary(fc.string({ maxLength: 10 }), fc.oneof(fc.string(), hostileNumber(), fc.constant(null)), { maxKeys: 4 }),
  );

/** Fields a client has no business setting: the server must decide them or ignore them. */
export const PRIVILEGED_FIELDS = ['id', 'role', 'status', 'signature', 'authorId', 'createdBy', 'passwordHash', 'tokenVersion', 'state', 'released', 'actorId', 'userId'];

/** Variations of a valid body: one field dropped or spoiled, privileged or prototype keys added. */
export function mutatedBody(valid: unknown): fc.Arbitrary<unknown> {
  const base = typeof valid === 'object' && valid !== null && !Array.isArray(valid) ? (valid as Record<string, unknown>) : {};
  const keys = Object.keys(base);
  const variants: Array<fc.Arbitrary<unknown>> = [
    fc.constant(base),
    fc.tuple(fc.constantFrom(...PRIVILEGED_FIELDS), hostileValue()).map(([key, value]) => ({ ...base, [key]: value })),
    fc.constantFrom('__proto__', 'constructor', 'prototype').map((key) => JSON.parse(`{${JSON.stringify(key)}:{"role":"admin","polluted":true},${JSON.stringify(base).slice(1)}`.replace(/,}$/, '}')) as unknown),
  ];
  if (keys.length > 0) {
    variants.push(fc.constantFrom(...keys).map((key) => Object.fromEntries(Object.entries(base).filter(([k]) => k !== key))));
    variants.push(fc.tuple(fc.constantFrom(...keys), hostileValue()).map(([key, value]) => ({ ...base, [key]: value })));
  }
  return fc.oneof(...variants);
}

export interface BodyCase {
  contentType: string;
  text: string;
}

/** A body case that prints itself shortened, so a failure report stays readable. */
const bodyCase = (contentType: string, text: string): BodyCase =>
  Object.assign(
    { contentType, text },
    { [fc.toStringMethod]: () => `${contentType} ${text.length > 300 ? `${text.slice(0, 150)}…(${text.length} chars)…${text.slice(-60)}` : text}` },
  );

const asJson = (value: unknown): BodyCase =>
  bodyCase('application/json', (JSON.stringify(value) ?? 'null').replaceAll(JSON.stringify(OVERFLOW), '1e999'));

/** Whole bodies: any JSON, mutations of the valid one, malformed JSON and other content types. */
export function hostileBody(valid: unknown): fc.Arbitrary<BodyCase> {
  return fc.oneof(
    { weight: 5, arbitrary: mutatedBody(valid).map(asJson) },
    { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 3 }).map(asJson) },
    { weight: 1, arbitrary: fc.anything({ maxDepth: 2 }).map(asJson) },
    { weight: 1, arbitrary: fc.string({ maxLength: 80 }).map((text) => bodyCase('application/json', `{${text}`)) },
    { weight: 1, arbitrary: fc.integer({ min: 5_000, max: 90_000 }).map((depth) => bodyCase('application/json', `${'['.repeat(depth)}${']'.repeat(depth)}`)) },
    { weight: 1, arbitrary: fc.constantFrom('text/plain', 'application/x-www-form-urlencoded', 'application/xml').map((contentType) => bodyCase(contentType, 'role=admin&status=active')) },
  );
}

export const hostileQuery = (): fc.Arbitrary<string> =>
  fc.oneof(
    fc.constant(''),
    fc.webQueryParameters().map((q) => (q ? `?${q}` : '')),
    fc.constantFrom('?__proto__[role]=admin', '?id=1&id=2', '?role=admin&status=active', `?q=${'x'.repeat(4000)}`),
  );

/** Idempotency keys: none, well-formed ones, and ones the server must refuse. */
export const hostileIdempotencyKey = (): fc.Arbitrary<string | null> =>
  fc.oneof(fc.constant(null), fc.stringMatching(/^[A-Za-z0-9_-]{1,100}$/), fc.stringMatching(/^[\x20-\x7e]{0,150}$/));
