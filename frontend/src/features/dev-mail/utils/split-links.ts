export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; href: string };

// http(s) only: a captured mail is untrusted text, and javascript: or data: links must stay inert.
const URL_PATTERN = /https?:\/\/[^\s<>"']+/g;
// Sentence punctuation after a link belongs to the sentence, not the address.
const TRAILING = /[.,;:!?)\]]+$/;

/**
 * Splits plain text into text and link parts.
 * Example: `splitLinks('Open https://lab.example/a.')` →
 * `[{kind:'text',text:'Open '},{kind:'link',href:'https://lab.example/a'},{kind:'text',text:'.'}]`
 */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index;
    const href = match[0].replace(TRAILING, '');
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) });
    parts.push({ kind: 'link', href });
    last = start + href.length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}
