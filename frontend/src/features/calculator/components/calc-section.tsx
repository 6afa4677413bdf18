import type { ReactNode } from 'react';

import { SECTION_INDEX_ID } from '../utils/calculator-sections';

type CalcSectionProps = { id: string; title: string; source: string; children: ReactNode };

/** One area of the library (jettability, wetting…): a heading, its sources in one line, its cards. */
export function CalcSection({ id, title, source, children }: CalcSectionProps) {
  const headingId = `${id}-heading`;
  return (
    <section id={id} aria-labelledby={headingId} className="scroll-mt-4 border-t border-graphite-200 pt-6">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4">
        <h2 id={headingId} className="text-2xl font-bold text-graphite-900">
          {title}
        </h2>
        <a href={`#${SECTION_INDEX_ID}`} className="inline-flex min-h-11 items-center font-bold text-copper-700 underline underline-offset-4 hover:text-copper-800">
          Back to the section list
        </a>
      </div>
      <p className="mb-5 text-sm text-graphite-600">{source}</p>
      <div className="grid gap-6 lg:grid-cols-2">{children}</div>
    </section>
  );
}
