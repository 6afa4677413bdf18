import { dropSpacingUm } from '@tracewright/shared';

import type { FieldReader } from './compute-outcome';

export type SpacingMode = 'dpi' | 'um';

/** Drop spacing in µm, read from whichever of the two fields the person chose to fill in. */
export function readSpacingUm(read: FieldReader<'dpi' | 'dropSpacingUm'>, mode: string): number {
  return mode === 'dpi' ? dropSpacingUm(read.number('dpi')) : read.number('dropSpacingUm');
}
