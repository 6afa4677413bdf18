import { InstructionBlocksView } from '../../../components/ui/instruction-blocks-view';
import { parseMarkdownLite } from '../../../lib/instruction-blocks';

/** The builder's preview of a step's instructions, as the tablet will show them. */
export function MarkdownLiteView({ text, className = '' }: { text: string; className?: string }) {
  const blocks = parseMarkdownLite(text);
  if (blocks.length === 0) return <p className={`text-graphite-600 ${className}`}>No instructions yet.</p>;
  return (
    <div className={`flex flex-col gap-3 ${className}`}>
      <InstructionBlocksView blocks={blocks} />
    </div>
  );
}
