import type { OutboxItem, WriteBody } from './outbox-types';

const PATH_REF = /\{ref:([A-Za-z0-9-]+)\}/g;

/** A path segment for an id the server has not given yet: `/timers/${pathRef(startId)}/stop`. */
export const pathRef = (itemId: string) => `{ref:${itemId}}`;

/** A body value for an id the server has not given yet. */
export const bodyRef = (itemId: string) => ({ $ref: itemId });

function isRef(value: unknown): value is { $ref: string } {
  return typeof value === 'object' && value !== null && typeof (value as { $ref?: unknown }).$ref === 'string';
}

function mapBody(value: unknown, replace: (ref: string) => unknown): unknown {
  if (isRef(value)) return replace(value.$ref);
  if (Array.isArray(value)) return value.map((v) => mapBody(v, replace));
  if (typeof value === 'object' && value !== null && !(value instanceof Blob)) {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, mapBody(v, replace)]));
  }
  return value;
}

/**
 * The writes a write waits for: ids named in its path or body.
 * @example refsOf({ path: '/api/runs/1/timers/{ref:a1}/stop', body: null }) // → ['a1']
 */
export function refsOf(item: Pick<OutboxItem, 'path' | 'body'>): string[] {
  const refs = new Set<string>();
  for (const match of item.path.matchAll(PATH_REF)) if (match[1]) refs.add(match[1]);
  mapBody(item.body, (ref) => refs.add(ref));
  return [...refs];
}

/**
 * The write with one ref filled in by the id the server gave that write.
 * @example fillRef({ path: '/t/{ref:a1}/stop', body: { ids: [{ $ref: 'a1' }] } }, 'a1', 42) // → path '/t/42/stop', body { ids: [42] }
 */
export function fillRef<T extends Pick<OutboxItem, 'path' | 'body'>>(item: T, ref: string, id: number): T {
  return {
    ...item,
    path: item.path.replaceAll(pathRef(ref), String(id)),
    body: item.body === null ? null : (mapBody(item.body, (r) => (r === ref ? id : { $ref: r })) as WriteBody),
  };
}
