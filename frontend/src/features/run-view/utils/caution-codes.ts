/**
 * The GHS hazard-statement and pictogram codes named in a caution's text, for the chips beside
 * it. The text itself (from the shared safety rules) stays the authority.
 * @example cautionCodes('Isopropanol: H225 — Highly flammable …; pictograms GHS02 Flame') // → { hazards: ['H225'], pictograms: ['GHS02'] }
 */
export function cautionCodes(text: string): { hazards: string[]; pictograms: string[] } {
  const unique = (matches: Iterable<RegExpMatchArray>) => [...new Set([...matches].map((m) => m[0]))];
  return {
    hazards: unique(text.matchAll(/\b(?:EUH\d{3}|H[234]\d{2}[A-Z]{0,2})\b/g)),
    pictograms: unique(text.matchAll(/\bGHS0[1-9]\b/g)),
  };
}
