import type { StepKind } from '@tracewright/shared';

import { STEP_GLYPH_PATHS } from './step-glyph-paths';

type StepGlyphProps = { kind: StepKind; className?: string; title?: string };

/** The kind's line glyph. Decorative unless `title` is given: the kind's name beside it speaks. */
export function StepGlyph({ kind, className = 'size-6', title }: StepGlyphProps) {
  return (
    <svg
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      className={`shrink-0 ${className}`}
      aria-hidden={title ? undefined : true}
      role={title ? 'img' : undefined}
      aria-label={title}
      focusable="false"
      data-step-kind={kind}
    >
      {STEP_GLYPH_PATHS[kind].map((d) => (
        <path key={d} d={d} />
      ))}
    </svg>
  );
}
