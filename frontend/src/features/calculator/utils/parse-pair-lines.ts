import { isDecimalToken, LIST_SEPARATORS, pastedLines } from './decimal-token';
import type { Parsed } from './parsed';

/**
 * Reads pasted pairs, one "first, second" per line (comma, semicolon, tab or spaces between them),
 * such as "minute, °C" or "strain %, Ω". Blank lines are skipped. `names` words the problems,
 * e.g. ['minute', '°C'].
 */
export function parsePairLines(raw: string, names: readonly [string, string]): Parsed<[number, number][]> {
  const pairs: [number, number][] = [];
  for (const [i, line] of pastedLines(raw).entries()) {
    const tokens = line.split(LIST_SEPARATORS).filter(Boolean);
    if (tokens.length === 0) continue;
    const where = `Line ${i + 1}`;
    if (tokens.length !== 2) {
      return { kind: 'invalid', message: `${where} needs two numbers, ${names[0]} then ${names[1]}; it has “${line.trim()}”.` };
    }
    const wrong = tokens.find((t) => !isDecimalToken(t));
    if (wrong !== undefined) {
      return { kind: 'invalid', message: `${where}: “${wrong}” is not a number. Use a point for decimals.` };
    }
    pairs.push([Number(tokens[0]), Number(tokens[1])]);
  }
  return pairs.length === 0 ? { kind: 'empty' } : { kind: 'ok', value: pairs };
}
