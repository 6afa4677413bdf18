import { evaluateReading, type ReadingEvaluation, type ReadingSpec } from '@tracewright/shared';

/**
 * A number as typed at the bench: a decimal comma is fine; empty or not a number gives null.
 * @example parseDecimal(' 10,5 ') // → 10.5; parseDecimal('') // → null
 */
export function parseDecimal(text: string): number | null {
  const cleaned = text.trim().replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}

/** The shared rule's verdict on what is typed so far, or null while it is not a number yet. */
export function liveEvaluation(spec: ReadingSpec, valueText: string, ambientText: string, tcrPerK: number | null): ReadingEvaluation | null {
  const value = parseDecimal(valueText);
  if (value === null) return null;
  return evaluateReading(spec, value, { ambientTempC: parseDecimal(ambientText), tcrPerK });
}
