export type InstructionBlock = { type: 'paragraph'; lines: string[] } | { type: 'list'; items: string[] };

const LIST_ITEM = /^\s*-\s+/;

/**
 * Instructions as engineers type them: blank lines split paragraphs, lines starting "- " are
 * list items, other line breaks are kept. Text only comes out; the view puts it in as text, so
 * markup typed here is shown as typed and never becomes HTML.
 * @example instructionBlocks('Wear gloves.\n\n- Peel the liner\n- Lay it flat')
 * // → [{ type: 'paragraph', lines: ['Wear gloves.'] }, { type: 'list', items: ['Peel the liner', 'Lay it flat'] }]
 */
export function instructionBlocks(text: string): InstructionBlock[] {
  const blocks: InstructionBlock[] = [];
  let current: InstructionBlock | null = null;
  for (const raw of text.replace(/\r\n?/g, '\n').split('\n')) {
    const line = raw.trim();
    if (line === '') {
      current = null;
    } else if (LIST_ITEM.test(raw)) {
      if (current?.type !== 'list') blocks.push((current = { type: 'list', items: [] }));
      current.items.push(line.replace(/^-\s+/, ''));
    } else {
      if (current?.type !== 'paragraph') blocks.push((current = { type: 'paragraph', lines: [] }));
      current.lines.push(line);
    }
  }
  return blocks;
}
