export type CureSample = { minute: number; tempC: number };
export type CureLogParse = { samples: CureSample[]; problems: string[] };

const NUMBER = /^-?\d+(?:[.,]\d+)?$/;
const toNumber = (text: string) => Number(text.replace(',', '.'));

/**
 * The oven log as typed, one "minute, °C" pair per line (comma, semicolon, tab or spaces between;
 * a decimal comma works when ; or a tab separates). Blank lines are skipped; each line
 * that is not a pair is named so the operator can fix it.
 * @example parseCureLog('0, 25\n10; 148.5\n20\t150') // → { samples: [{ minute: 0, tempC: 25 }, { minute: 10, tempC: 148.5 }, { minute: 20, tempC: 150 }], problems: [] }
 */
export function parseCureLog(text: string): CureLogParse {
  const samples: CureSample[] = [];
  const problems: string[] = [];
  text.split(/\r?\n/).forEach((raw, index) => {
    const line = raw.trim();
    if (!line) return;
    // With ; or a tab between the two, a comma may be a decimal comma; otherwise it separates.
    const parts = /[;\t]/.test(line) ? line.split(/[;\t]/) : line.split(/[,\s]+/);
    const cells = parts.map((p) => p.trim()).filter(Boolean);
    if (cells.length !== 2 || !cells.every((c) => NUMBER.test(c))) {
      problems.push(`Line ${index + 1} ("${line}") is not "minute, °C".`);
      return;
    }
    samples.push({ minute: toNumber(cells[0] as string), tempC: toNumber(cells[1] as string) });
  });
  return { samples, problems };
}
