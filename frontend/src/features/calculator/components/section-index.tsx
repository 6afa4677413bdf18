import { CALCULATOR_SECTIONS, SECTION_INDEX_ID } from '../utils/calculator-sections';

/** Anchor links to each section, so a long page stays quick to move around on a tablet. */
export function SectionIndex() {
  return (
    <nav id={SECTION_INDEX_ID} aria-label="Calculator sections" className="mb-8 scroll-mt-4">
      <ol className="flex flex-wrap gap-2">
        {CALCULATOR_SECTIONS.map((section, i) => (
          <li key={section.id}>
            <a
              href={`#${section.id}`}
              className="inline-flex min-h-12 items-center gap-2 rounded-md border-2 border-graphite-500 bg-white px-4 font-bold text-graphite-900 no-underline hover:bg-graphite-50"
            >
              {/* The ordered list already tells a screen reader the position. */}
              <span aria-hidden="true" className="tabular text-graphite-600">
                {i + 1}
              </span>
              {section.title}
            </a>
          </li>
        ))}
      </ol>
    </nav>
  );
}
