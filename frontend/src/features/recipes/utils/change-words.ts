const FIELD_LABELS: Record<string, string> = {
  title: 'Title',
  instructions: 'Instructions',
  minMinutes: 'Shortest time',
  maxMinutes: 'Longest time',
  handsOnMinutes: 'Hands-on time',
  safetyNotes: 'Own safety notes',
  readingSpecs: 'Readings',
  temperatureC: 'Temperature',
  minutes: 'Time at temperature',
  rampCPerMinute: 'Ramp',
  heatSourceId: 'Heat source',
  inkId: 'Ink',
  channel: 'Channel',
  dpi: 'Resolution',
  passes: 'Passes',
  platenTempC: 'Platen temperature',
  artworkFileId: 'Artwork',
  printedAreaFraction: 'Printed area fraction',
  pieceAreaMm2: 'Piece area',
  nozzleCheckRequired: 'Nozzle check',
  pressureKPa: 'Pressure',
  seconds: 'Press time',
  peel: 'Peel',
  method: 'Method',
  parts: 'Parts',
  substrateId: 'Print substrate',
  receivingSubstrateId: 'Receiving material',
  printerId: 'Printer',
  channelPlan: 'Channel plan',
  heatSourceIds: 'Heat sources',
  treaterIds: 'Surface treaters',
  changeNote: 'What changed',
};

/**
 * A changed field's path in words, keeping list item names: "params.temperatureC" → "Temperature",
 * "readingSpecs[r-trace].upperLimit" → "Readings r-trace: upperLimit".
 * @example changeLabel('params.minutes') // → 'Time at temperature'
 */
export function changeLabel(path: string): string {
  const plain = path.replace(/^params\./, '');
  if (FIELD_LABELS[plain]) return FIELD_LABELS[plain];
  const item = /^(\w+)\[([^\]]+)\](?:\.(.+))?$/.exec(plain);
  if (item) return `${FIELD_LABELS[item[1] as string] ?? item[1]} ${item[2]}${item[3] ? `: ${FIELD_LABELS[item[3]] ?? item[3]}` : ''}`;
  if (plain.endsWith('#order')) return `${FIELD_LABELS[plain.slice(0, -6)] ?? plain.slice(0, -6)} order`;
  return plain;
}

/**
 * A value as the diff shows it: empty as a dash, text in quotes, lists and objects compactly.
 * @example changeValue(null) // → '—'; changeValue('cold') // → '“cold”'; changeValue(150) // → '150'
 */
export function changeValue(value: unknown): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'string') return `“${value.length > 80 ? `${value.slice(0, 80)}…` : value}”`;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value === true ? 'yes' : value === false ? 'no' : value);
  const json = JSON.stringify(value);
  return json.length > 80 ? `${json.slice(0, 80)}…` : json;
}
