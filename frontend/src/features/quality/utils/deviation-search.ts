import { DeviationQuerySchema, type DeviationQuery } from '@tracewright/shared';

/**
 * Reads the queue's filters from the address bar with the API's own schema. A hand-edited or
 * stale value (page=abc, state=lost) falls back to that field's default instead of failing.
 */
export function parseDeviationSearch(params: URLSearchParams): DeviationQuery {
  const raw = Object.fromEntries([...params.entries()].filter(([, v]) => v.trim() !== ''));
  const parsed = DeviationQuerySchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const bad = new Set(parsed.error.issues.map((issue) => String(issue.path[0])));
  return DeviationQuerySchema.parse(Object.fromEntries(Object.entries(raw).filter(([key]) => !bad.has(key))));
}

const DEFAULTS = DeviationQuerySchema.parse({});

/** The address search for a query, leaving out whatever is at its default, lists as comma lists. */
export function deviationSearchFor(query: Partial<DeviationQuery>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value === undefined || value === null || value === '') continue;
    if (Array.isArray(value)) {
      if (value.length > 0) params.set(key, value.join(','));
      continue;
    }
    if (value === DEFAULTS[key as keyof DeviationQuery]) continue;
    params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `?${text}` : '';
}

/** Adds the value to the list if it is missing, takes it out if present. */
export function toggled<T>(list: readonly T[] | undefined, value: T): T[] {
  const current = list ?? [];
  return current.includes(value) ? current.filter((v) => v !== value) : [...current, value];
}
