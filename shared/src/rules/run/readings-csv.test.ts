import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { csvCell, READINGS_CSV_HEADER, readingsCsv, type ReadingCsvRow } from './readings-csv';

// Quoting per RFC 4180 §2 (fields with commas, quotes or line breaks in double quotes; inner quotes
// doubled; CRLF line ends). Formula neutralising per CWE-1236 (leading = + - @ → prefix ').

/** A strict RFC 4180 reader for the tests: every record ends in CRLF; quoted fields may hold anything. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let i = 0;
  while (i < text.length) {
    let field = '';
    if (text[i] === '"') {
      i += 1;
      for (;;) {
        if (i >= text.length) throw new Error('unterminated quoted field');
        if (text[i] === '"' && text[i + 1] === '"') { field += '"'; i += 2; }
        else if (text[i] === '"') { i += 1; break; }
        else { field += text[i]; i += 1; }
      }
    } else {
      while (i < text.length && text[i] !== ',' && text[i] !== '\r') {
        if (text[i] === '"' || text[i] === '\n') throw new Error(`bare ${JSON.stringify(text[i])} in an unquoted field`);
        field += text[i];
        i += 1;
      }
    }
    row.push(field);
    if (text[i] === ',') i += 1;
    else if (text.startsWith('\r\n', i)) { rows.push(row); row = []; i += 2; }
    else throw new Error(`unexpected ${JSON.stringify(text[i])} at ${i}`);
  }
  if (row.length > 0) throw new Error('last record does not end in CRLF');
  return rows;
}

const row = (overrides: Partial<ReadingCsvRow> = {}): ReadingCsvRow => ({
  runCode: 'R-2026-0007',
  pieceCode: 'R-2026-0007-01',
  stepTitle: 'Inspect heater',
  readingName: 'Trace resistance',
  value: 11.56,
  unit: 'Ω',
  correctedValue: 10,
  lowerLimit: null,
  upperLimit: 10.5,
  inLimits: true,
  instrumentName: 'Meter 3',
  recordedBy: 'Ana Operator',
  recordedAt: new Date('2026-12-02T10:15:30.250Z'),
  supersededBy: null,
  correctionReason: null,
  ...overrides,
});

describe('csvCell', () => {
  // prettier-ignore
  it.each([
    { name: 'plain text', text: 'Trace resistance', cell: 'Trace resistance' },
    { name: 'a comma', text: 'Inspect, heater', cell: '"Inspect, heater"' },
    { name: 'quotes', text: 'the "long" trace', cell: '"the ""long"" trace"' },
    { name: 'a line break', text: 'line 1\nline 2', cell: '"line 1\nline 2"' },
    { name: 'a CRLF inside', text: 'a\r\nb', cell: '"a\r\nb"' },
    { name: 'an empty value', text: '', cell: '' },
    { name: 'a formula', text: '=1+1', cell: "'=1+1" },
    { name: 'a formula with quotes and commas', text: '=HYPERLINK("http://x","y")', cell: '"\'=HYPERLINK(""http://x"",""y"")"' },
    { name: 'a leading plus', text: '+41 55 000', cell: "'+41 55 000" },
    { name: 'a leading at sign', text: '@SUM(A1:A2)', cell: "'@SUM(A1:A2)" },
    { name: 'a leading minus on text', text: '-cmd', cell: "'-cmd" },
    { name: 'a leading tab', text: '\t=1', cell: "'\t=1" },
    { name: 'a leading CR', text: '\r=1', cell: '"\'\r=1"' },
    { name: 'a plain negative number', text: '-3.25', cell: '-3.25' },
    { name: 'a negative number in exponent form', text: '-1e-7', cell: '-1e-7' },
    { name: 'a negative sum', text: '-3+4', cell: "'-3+4" },
    { name: 'a formula after a space', text: ' =1', cell: ' =1' },
  ])('when a cell holds $name, then it is written as expected', ({ text, cell }) => {
    expect(csvCell(text)).toBe(cell);
  });
});

describe('readingsCsv', () => {
  it('when readings are exported, then the header comes first and every line ends in CRLF', () => {
    const csv = readingsCsv([row()]);
    expect(csv.split('\r\n')).toEqual([
      READINGS_CSV_HEADER.join(','),
      'R-2026-0007,R-2026-0007-01,Inspect heater,Trace resistance,11.56,Ω,10,,10.5,yes,Meter 3,Ana Operator,2026-12-02T10:15:30.250Z,',
      '',
    ]);
    expect(READINGS_CSV_HEADER).toContain('corrected value (20 °C)');
  });

  // prettier-ignore
  it.each([
    { name: 'a negative value and no piece', overrides: { value: -0.5, pieceCode: null, correctedValue: null, inLimits: false }, column: 4, cell: '-0.5' },
    { name: 'a corrected reading', overrides: { supersededBy: '2026-12-02T10:20:00Z' }, column: 13, cell: 'superseded by 2026-12-02T10:20:00Z' },
    { name: 'a correction', overrides: { correctionReason: 'Probe slipped; re-measured.' }, column: 13, cell: 'correction reason: Probe slipped; re-measured.' },
    { name: 'an operator named as a formula', overrides: { recordedBy: '=cmd|" /C calc"!A0' }, column: 11, cell: '\'=cmd|" /C calc"!A0' },
    { name: 'no instrument', overrides: { instrumentName: null }, column: 10, cell: '' },
  ])('when a row has $name, then its cell reads back as expected', ({ overrides, column, cell }) => {
    const [, parsed] = parseCsv(readingsCsv([row(overrides)]));
    expect(parsed?.[column]).toBe(cell);
  });

  it('when any text fills the cells, then the CSV parses back to the same rows, formula starts prefixed', () => {
    const text = fc.string({ unit: fc.constantFrom('a', 'e', ' ', ',', '"', '\r', '\n', '=', '+', '-', '@', '\t', '1', '.', 'Ω') });
    const reading = fc.record({
      runCode: text,
      pieceCode: fc.option(text),
      stepTitle: text,
      readingName: text,
      value: fc.double({ noNaN: true, noDefaultInfinity: true }),
      unit: text,
      recordedBy: text,
      instrumentName: fc.option(text),
    });
    fc.assert(
      fc.property(fc.array(reading, { maxLength: 5 }), (partials) => {
        const rows = partials.map((p) => row(p));
        const parsed = parseCsv(readingsCsv(rows));
        expect(parsed).toHaveLength(rows.length + 1);
        expect(parsed[0]).toEqual([...READINGS_CSV_HEADER]);
        rows.forEach((r, i) => {
          const cells = parsed[i + 1] as string[];
          expect(cells).toHaveLength(READINGS_CSV_HEADER.length);
          const originals = [r.runCode, r.pieceCode ?? '', r.stepTitle, r.readingName, String(r.value), r.unit];
          originals.forEach((original, column) => {
            // oracle independent of the implementation's pattern: a plain negative number is what Number() reads whole
            const isPlainNegative = /^-\S*$/.test(original) && Number.isFinite(Number(original));
            const isFormulaLike = ['=', '+', '-', '@', '\t', '\r'].includes(original.charAt(0)) && !isPlainNegative;
            expect(cells[column]).toBe(isFormulaLike ? `'${original}` : original);
          });
          // the value reads back as the same number (−0 is written as 0, which compares equal)
          expect(Number(cells[4]) === r.value).toBe(true);
        });
      }),
      { numRuns: 300 },
    );
  });
});
