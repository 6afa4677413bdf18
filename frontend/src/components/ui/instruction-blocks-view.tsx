import { Fragment } from 'react';

import type { LiteBlock } from '../../lib/instruction-blocks';

/**
 * Paragraphs and lists of typed instructions. Everything goes into the page as text nodes, so
 * anything that looks like markup is shown as typed and never becomes HTML.
 */
export function InstructionBlocksView({ blocks, listClassName = 'pl-6' }: { blocks: readonly LiteBlock[]; listClassName?: string }) {
  return blocks.map((block, i) =>
    block.type === 'list' ? (
      <ul key={i} className={`list-disc space-y-1 ${listClassName}`}>
        {block.items.map((item, j) => (
          <li key={j}>{item}</li>
        ))}
      </ul>
    ) : (
      <p key={i}>
        {block.lines.map((line, j) => (
          <Fragment key={j}>
            {j > 0 ? <br /> : null}
            {line}
          </Fragment>
        ))}
      </p>
    ),
  );
}
