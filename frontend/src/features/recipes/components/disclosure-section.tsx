import { useId, useState, type ReactNode } from 'react';

import { Icon } from '../../../components/icons/icon';

type DisclosureSectionProps = { title: string; summary?: ReactNode; initiallyOpen: boolean; children: ReactNode };

/** A section that folds away; its heading is the button that opens and closes it. */
export function DisclosureSection({ title, summary, initiallyOpen, children }: DisclosureSectionProps) {
  const [isOpen, setIsOpen] = useState(initiallyOpen);
  const panelId = useId();
  return (
    <section className="mb-6 rounded-md border border-graphite-300 bg-white">
      <h2 className="text-lg font-bold">
        <button type="button" aria-expanded={isOpen} aria-controls={panelId} onClick={() => setIsOpen((v) => !v)} className="flex min-h-12 w-full items-center gap-2 px-4 py-2 text-left">
          <Icon name={isOpen ? 'chevronDown' : 'chevronRight'} className="size-5" />
          {title}
          {summary ? <span className="ml-2 truncate text-sm font-normal text-graphite-700">{summary}</span> : null}
        </button>
      </h2>
      <div id={panelId} hidden={!isOpen} className="border-t border-graphite-200 p-4">
        {children}
      </div>
    </section>
  );
}
