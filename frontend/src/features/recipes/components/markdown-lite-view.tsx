import { Fragment } from 'react';

import { parseMarkdownLite } from '../utils/markdown-lite';

/**
 * Instructions drawn from their markdown-lite text. Everything goes into the page as text nodes,
 * so anything that looks like markup is shown as typed and never becomes HTML.
 */
export function MarkdownLiteView({ text, className = '' }: { text: string; className?: string }) {
  const blocks = parseMarkdownLite(text);
  if (blocks.length === 0) return <p className={`text-graphite-600 ${className}`}>No instructions yet.</p>;
  return (
    <div className={`flex flex-col gap-3 ${className}`}>
      {blocks.map((block, i) =>
        block.type === 'list' ? (
          <ul key={i} className="list-disc space-y-1 pl-6">
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
    </div>
  );
}
