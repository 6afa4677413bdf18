/** Unit suffixes of our field names, longest first, and how a person writes them. */
const UNIT_SUFFIXES: Array<[string, string]> = [
  ['MetresPerSecond', 'm/s'],
  ['MilliNPerM', 'mN/m'],
  ['MilliPaS', 'mPa·s'],
  ['KgPerM3', 'kg/m³'],
  ['KJPerMol', 'kJ/mol'],
  ['OhmPerSq', 'Ω/sq'],
  ['WtPercent', 'wt%'],
  ['PerK', '1/K'],
  ['TempC', '°C'],
  ['Ohm', 'Ω'],
  ['Deg', '°'],
  ['Um', 'µm'],
  ['Pl', 'pL'],
  ['Mm', 'mm'],
];

/**
 * A field name as a person reads it, with its unit: our names carry the unit as a suffix.
 * @example fieldLabel('viscosityMilliPaS') // → 'Viscosity (mPa·s)'
 * @example fieldLabel('measuredTempC') // → 'Measured temperature (°C)'
 */
export function fieldLabel(field: string): string {
  const match = UNIT_SUFFIXES.find(([suffix]) => field.endsWith(suffix) && field.length > suffix.length);
  const stem = match ? field.slice(0, -match[0].length) : field;
  const words = stem.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
  const text = words.charAt(0).toUpperCase() + words.slice(1);
  if (!match) return text;
  return match[0] === 'TempC' ? `${text} temperature (°C)`.replace(/ temp temperature/, ' temperature') : `${text} (${match[1]})`;
}
