import { STEP_KIND_LABELS, type StepKind } from '@tracewright/shared';

import { StepGlyph } from './step-glyph';

type StepKindLabelProps = { kind: StepKind; size?: 'sm' | 'md' | 'lg'; className?: string };

const SIZES = { sm: { glyph: 'size-5', text: 'text-sm' }, md: { glyph: 'size-6', text: 'text-base' }, lg: { glyph: 'size-9', text: 'text-xl' } };

/** Glyph and name of a step kind together: how a kind is named everywhere (builder, run view). */
export function StepKindLabel({ kind, size = 'md', className = '' }: StepKindLabelProps) {
  const look = SIZES[size];
  return (
    <span className={`inline-flex items-center gap-2 font-bold text-graphite-700 ${look.text} ${className}`}>
      <StepGlyph kind={kind} className={look.glyph} />
      {STEP_KIND_LABELS[kind]}
    </span>
  );
}
