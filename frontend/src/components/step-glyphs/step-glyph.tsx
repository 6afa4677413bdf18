import type { StepKind } from '@tracewright/shared';

import { LineGlyph } from '../icons/line-glyph';
import { STEP_GLYPH_PATHS } from './step-glyph-paths';

type StepGlyphProps = { kind: StepKind; className?: string; title?: string };

/** The kind's line glyph. Decorative unless `title` is given: the kind's name beside it speaks. */
export function StepGlyph({ kind, className = 'size-6', title }: StepGlyphProps) {
  return <LineGlyph paths={STEP_GLYPH_PATHS[kind]} className={className} title={title} data-step-kind={kind} />;
}
