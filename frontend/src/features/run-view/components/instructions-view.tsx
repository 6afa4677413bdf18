import { Fragment } from 'react';

import { instructionBlocks } from '../utils/instructions-lite';

/** The step's instructions; everything goes in as text, so typed markup is shown, never run. */
export function InstructionsView({ text }: { text: string }) {
  const blocks = instructionBlocks(text);
  if (blocks.length === 0) return null;
  return (
    <section aria-label="Instructions" className="flex max-w-prose flex-col gap-3 leading-relaxed">
      {blocks.map((block, i) =>
        block.type === 'list' ? (
          <ul key={i} className="list-disc space-y-1 pl-7">
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
      )}
    </section>
  );
}
