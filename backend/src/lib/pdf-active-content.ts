import { inflateSync } from 'node:zlib';

// PDF names are "/" followed by regular characters; "#xx" inside a name is an escaped byte, so
// "/J#61vaScript" is "/JavaScript". Delimiters and whitespace end a name (ISO 32000-1 §7.3.5).
const NAME = /\/[^\s()<>[\]{}/%]*/g;
const ACTIVE = /\/(JavaScript|JS|Launch)(?=[\s()<>[\]{}/%]|$)/;
const unescapeNames = (text: string) =>
  text.replace(NAME, (name) => name.replace(/#([0-9a-fA-F]{2})/g, (_m, hex: string) => String.fromCharCode(parseInt(hex, 16))));

/** Object streams (PDF 1.5+) hold compressed dictionaries, where a script action could hide. */
const OBJECT_STREAM = /\/Type\s*\/ObjStm/;
/** Inflating a small stream into gigabytes is a known trick; no honest artwork needs more. */
const MAX_INFLATED_BYTES = 32 * 1024 * 1024;

export type PdfVerdict = { ok: true } | { ok: false; reason: string };

/**
 * Looks for what a PDF viewer would run: JavaScript actions (/JavaScript, /JS, also when set off by
 * /OpenAction or /AA) and /Launch, in the file and inside its compressed object streams. Encrypted
 * files cannot be looked into, so they are refused too.
 *
 * @example inspectPdf(Buffer.from('%PDF-1.7\n1 0 obj << /OpenAction << /S /JavaScript /JS (app.alert(1)) >> >> endobj'))
 * // → { ok: false, reason: 'it contains JavaScript (/JavaScript)' }
 */
export function inspectPdf(bytes: Buffer): PdfVerdict {
  const text = bytes.toString('latin1');
  const found = (body: string): PdfVerdict | null => {
    const match = ACTIVE.exec(unescapeNames(body));
    if (!match) return null;
    return { ok: false, reason: match[1] === 'Launch' ? 'it can launch other programs (/Launch)' : `it contains JavaScript (/${match[1]})` };
  };
  const plain = found(text);
  if (plain) return plain;
  if (/\/Encrypt\b/.test(unescapeNames(text))) return { ok: false, reason: 'it is encrypted, so it cannot be checked for scripts' };

  let budget = MAX_INFLATED_BYTES;
  for (const { dictionary, data } of streams(text, bytes)) {
    if (!OBJECT_STREAM.test(unescapeNames(dictionary))) continue;
    let inflated: Buffer;
    try {
      inflated = inflateSync(data, { maxOutputLength: budget });
    } catch {
      return { ok: false, reason: 'one of its object streams cannot be read, so it cannot be checked for scripts' };
    }
    budget -= inflated.length;
    const hidden = found(inflated.toString('latin1'));
    if (hidden) return hidden;
  }
  return { ok: true };
}

/** Each "stream … endstream" body with the dictionary text just before it. */
function* streams(text: string, bytes: Buffer): Generator<{ dictionary: string; data: Buffer }> {
  const keyword = /stream\r?\n/g;
  let match: RegExpExecArray | null;
  while ((match = keyword.exec(text)) !== null) {
    if (text.slice(Math.max(0, match.index - 3), match.index) === 'end') continue;
    const start = match.index + match[0].length;
    const end = text.indexOf('endstream', start);
    if (end === -1) return;
    const objectStart = text.lastIndexOf(' obj', match.index);
    yield { dictionary: text.slice(Math.max(0, objectStart), match.index), data: bytes.subarray(start, end) };
    keyword.lastIndex = end + 'endstream'.length;
  }
}
