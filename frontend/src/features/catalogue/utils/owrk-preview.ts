import { owrkSurfaceEnergy, ProcessInputError, type SurfaceEnergy } from '@tracewright/shared';

import { numberOrNull } from './form-values';

export type OwrkPreview = { energy: SurfaceEnergy } | { problem: string };

/**
 * Surface energy from two typed angles with the shared OWRK function, or what is missing.
 * A preview only: the figure the checks use is the server's.
 */
export function owrkPreview(water: unknown, diiodomethane: unknown): OwrkPreview {
  const w = numberOrNull(water);
  const d = numberOrNull(diiodomethane);
  if (w === null || d === null) return { problem: 'Type both angles to see the surface energy.' };
  if (Number.isNaN(w) || Number.isNaN(d)) return { problem: 'Angles are numbers of degrees, e.g. 72.5.' };
  try {
    return { energy: owrkSurfaceEnergy({ waterAngleDeg: w, diiodomethaneAngleDeg: d }) };
  } catch (error) {
    if (error instanceof ProcessInputError) return { problem: 'Contact angles run from 0° to 180°.' };
    throw error;
  }
}
