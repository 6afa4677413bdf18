import { ProcessInputError } from '@tracewright/shared';

import { parseNumberInput } from './parse-number-input';
import type { Parsed } from './parsed';

/** What one calculator card shows: a result, or why there is none yet. */
export interface Outcome<T> {
  result: T | null;
  /** A required field is still empty: nothing is wrong, there is just nothing to show. */
  isIncomplete: boolean;
  /** Problems keyed by the card's field names, shown under those fields. */
  fieldErrors: Readonly<Record<string, string>>;
  /** A problem no single field owns (the library named an input the card does not show). */
  formError: string | null;
}

/** How a calculation reads the card's text fields; each read records its own problem. */
export interface FieldReader<K extends string> {
  number: (key: K) => number;
  optionalNumber: (key: K) => number | undefined;
  parsed: <V>(key: K, parse: (raw: string) => Parsed<V>, placeholder: V) => V;
}

/**
 * Runs one library calculation on a card's text fields. Every field is read before anything is
 * reported, so each mistyped field shows its own message at once; an empty required field means
 * "not yet"; a ProcessInputError from the library lands under the field it names. `aliases` maps
 * library field names the card shows under another name (strain → strainPercent).
 */
export function computeOutcome<K extends string, T>(
  values: Readonly<Record<K, string>>,
  calculate: (read: FieldReader<K>) => T,
  aliases: Readonly<Partial<Record<string, NoInfer<K>>>> = {},
): Outcome<T> {
  const fieldErrors: Record<string, string> = {};
  let isIncomplete = false;

  function take<V>(key: K, parsed: Parsed<V>, placeholder: V, isRequired: boolean): V {
    if (parsed.kind === 'ok') return parsed.value;
    if (parsed.kind === 'invalid') fieldErrors[key] = parsed.message;
    else if (isRequired) isIncomplete = true;
    return placeholder;
  }
  const read: FieldReader<K> = {
    number: (key) => take(key, parseNumberInput(values[key]), Number.NaN, true),
    optionalNumber: (key) => take<number | undefined>(key, parseNumberInput(values[key]), undefined, false),
    parsed: (key, parse, placeholder) => take(key, parse(values[key]), placeholder, true),
  };

  let result: T | null = null;
  let libraryError: ProcessInputError | null = null;
  try {
    result = calculate(read);
  } catch (error) {
    // Anything else is a bug, and the route's error boundary must see it.
    if (!(error instanceof ProcessInputError)) throw error;
    libraryError = error;
  }

  // Placeholders stood in for unreadable fields, so the library's verdict on them means nothing.
  if (Object.keys(fieldErrors).length > 0) return { result: null, isIncomplete: false, fieldErrors, formError: null };
  if (isIncomplete) return { result: null, isIncomplete: true, fieldErrors: {}, formError: null };
  if (libraryError) {
    const key = fieldKeyFor(libraryError.field, Object.keys(values), aliases);
    return key
      ? { result: null, isIncomplete: false, fieldErrors: { [key]: libraryError.message }, formError: null }
      : { result: null, isIncomplete: false, fieldErrors: {}, formError: libraryError.message };
  }
  return { result, isIncomplete: false, fieldErrors: {}, formError: null };
}

// "values[3]" and "samples[2].minute" belong to the pasted field "values" / "samples".
function fieldKeyFor(field: string, keys: readonly string[], aliases: Readonly<Partial<Record<string, string>>>): string | null {
  const aliased = aliases[field];
  if (aliased) return aliased;
  if (keys.includes(field)) return field;
  const base = field.split(/[.[]/)[0] ?? '';
  return keys.includes(base) ? base : null;
}
