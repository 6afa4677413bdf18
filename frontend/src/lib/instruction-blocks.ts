export type LiteBlock = { type: 'paragraph'; lines: string[] } | { type: 'list'; items: string[] };

const LIST_ITEM = /^\s*-\s+/;

/**
 * Instructions as people type them: a blank line starts a new paragraph, lines starting with
 * "- " are list items, and every other line break is kept. Only text comes out; the renderer
 * puts it into the page as text, so markup typed here is shown, never run.
 *
 * @example
 * parseMarkdownLite('Wear gloves.\n\n- Peel the liner\n- Lay the sheet flat')
 * // → [{ type: 'paragraph', lines: ['Wear gloves.'] }, { type: 'list', items: ['Peel the liner', 'Lay the sheet flat'] }]
 */
export function parseMarkdownLite(text: string): LiteBlock[] {
  const blocks: LiteBlock[] = [];
  let current: LiteBlock | null = null;
  for (const raw of text.replace(/\r\n?/g, '\n').split('\n')) {
    const line = raw.trimEnd();
    if (line.trim() === '') {
      current = null;
      continue;
    }
    if (LIST_ITEM.test(line)) {
      if (current?.type !== 'list') {
        current = { type: 'list', items: [] };
        blocks.push(current);
      }
      current.items.push(line.replace(LIST_ITEM, ''));
      continue;
    }
    if (current?.type !== 'paragraph') {
      current = { type: 'paragraph', lines: [] };
      blocks.push(current);
    }
    current.lines.push(line.trim());
  }
  return blocks;
}
