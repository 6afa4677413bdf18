import { describe, expect, it } from 'vitest';

import { parseMarkdownLite } from './instruction-blocks';

describe('parseMarkdownLite', () => {
  it.each([
    ['when the text is empty, then there are no blocks', '', []],
    ['when lines are separated by a blank line, then each is a paragraph', 'Wear gloves.\n\nPreheat the oven.', [{ type: 'paragraph', lines: ['Wear gloves.'] }, { type: 'paragraph', lines: ['Preheat the oven.'] }]],
    ['when lines follow each other, then they stay one paragraph with their breaks', 'Line one\nLine two', [{ type: 'paragraph', lines: ['Line one', 'Line two'] }]],
    ['when lines start with "- ", then they form one list', '- Peel the liner\n- Lay it flat', [{ type: 'list', items: ['Peel the liner', 'Lay it flat'] }]],
    ['when a list follows a paragraph directly, then both blocks come out in order', 'Steps:\n- One\n- Two', [{ type: 'paragraph', lines: ['Steps:'] }, { type: 'list', items: ['One', 'Two'] }]],
    ['when a dash has no space after it, then it is ordinary text', '-20 °C storage', [{ type: 'paragraph', lines: ['-20 °C storage'] }]],
    ['when Windows line ends are used, then they read like plain ones', 'A\r\n\r\nB', [{ type: 'paragraph', lines: ['A'] }, { type: 'paragraph', lines: ['B'] }]],
  ])('%s', (_name, text, blocks) => {
    expect(parseMarkdownLite(text)).toEqual(blocks);
  });
});
