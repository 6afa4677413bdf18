/** One reading as exported: names already resolved (run code, piece code, step title, people). */
export interface ReadingCsvRow {
  runCode: string;
  pieceCode: string | null;
  stepTitle: string;
  readingName: string;
  value: number;
  unit: string;
  /** The value corrected to 20 °C (resistance readings), else null. */
  correctedValue: number | null;
  lowerLimit: number | null;
  upperLimit: number | null;
  inLimits: boolean;
  instrumentName: string | null;
  recordedBy: string;
  recordedAt: Date;
  /** On a reading later corrected: what replaced it (e.g. the time or id of the new reading). */
  supersededBy: string | null;
  /** On a correcting reading: why the first value was replaced. */
  correctionReason: string | null;
}

/** Column names of the readings export, in order; the corrected value is always at 20 °C. */
export const READINGS_CSV_HEADER = [
  'run',
  'piece',
  'step',
  'reading',
  'value',
  'unit',
  'corrected value (20 °C)',
  'lower',
  'upper',
  'in limits',
  'instrument',
  'recorded by',
  'recorded at (UTC ISO)',
  'superseded by / correction reason',
] as const;

const CRLF = '\r\n';

// Spreadsheets run a cell that starts with one of these as a formula (CWE-1236; the tab and CR
// entries follow the OWASP "CSV Injection" page, from memory). A leading ' makes it text.
const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NEGATIVE_NUMBER = /^-(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const NEEDS_QUOTES = /[",\r\n]/;

/**
 * One cell, safe to open in a spreadsheet and RFC 4180-quoted: a formula-like start gets a
 * leading single quote (a plain negative number is left alone, so values stay numbers), then
 * a cell holding a comma, quote, CR or LF is wrapped in quotes with inner quotes doubled.
 *
 * @example csvCell('=HYPERLINK("x")') // → '"\'=HYPERLINK(""x"")"'
 * @example csvCell('-3.5') // → '-3.5'
 */
export function csvCell(text: string): string {
  const safe = FORMULA_START.test(text) && !PLAIN_NEGATIVE_NUMBER.test(text) ? `'${text}` : text;
  return NEEDS_QUOTES.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

const num = (value: number | null) => (value === null ? '' : String(value));

function rowCells(row: ReadingCsvRow): string[] {
  const note = [row.supersededBy && `superseded by ${row.supersededBy}`, row.correctionReason && `correction reason: ${row.correctionReason}`].filter(Boolean).join('; ');
  return [
    row.runCode,
    row.pieceCode ?? '',
    row.stepTitle,
    row.readingName,
    String(row.value),
    row.unit,
    num(row.correctedValue),
    num(row.lowerLimit),
    num(row.upperLimit),
    row.inLimits ? 'yes' : 'no',
    row.instrumentName ?? '',
    row.recordedBy,
    row.recordedAt.toISOString(),
    note,
  ];
}

/**
 * Readings as RFC 4180 CSV: a header row, then one line per reading, every line ending in CRLF.
 * Numbers are written in full (no rounding); times in UTC ISO 8601; every cell is neutralised
 * against formula injection (see csvCell). No byte-order mark: add one where a spreadsheet needs it.
 *
 * @example
 * readingsCsv([{ runCode: 'R-2026-0007', pieceCode: 'R-2026-0007-01', stepTitle: 'Inspect, heater', readingName: 'Trace resistance', value: 11.56, … }])
 * // → 'run,piece,step,…\r\nR-2026-0007,R-2026-0007-01,"Inspect, heater",Trace resistance,11.56,Ω,10,…\r\n'
 */
export function readingsCsv(rows: readonly ReadingCsvRow[]): string {
  return [READINGS_CSV_HEADER, ...rows.map(rowCells)].map((cells) => cells.map(csvCell).join(',') + CRLF).join('');
}
