import { InstructionBlocksView } from '../../../components/ui/instruction-blocks-view';
import { parseMarkdownLite } from '../../../lib/instruction-blocks';

/** The step's instructions; everything goes in as text, so typed markup is shown, never run. */
export function InstructionsView({ text }: { text: string }) {
  const blocks = parseMarkdownLite(text);
  if (blocks.length === 0) return null;
  return (
    <section aria-label="Instructions" className="flex max-w-prose flex-col gap-3 leading-relaxed">
      <InstructionBlocksView blocks={blocks} listClassName="pl-7" />
    </section>
  );
}
