import { requireNonNegative, requirePositive } from './input-guards';

/**
 * Default margin between substrate surface energy and ink surface tension: common practice,
 * no source. An industrial-practice page (REFERENCES §2.4) asks for roughly 8–10 mN/m.
 */
export const DEFAULT_WETTING_MARGIN_MILLI_N_PER_M = 10;

/**
 * How far the substrate's surface energy exceeds the ink's surface tension, and whether that meets
 * the required margin (a margin equal to the requirement passes).
 *
 * @example
 * // PET-like surface 50.36 mN/m, ink 28 mN/m → { marginMilliNPerM: 22.36, ok: true }
 * wettingMargin({ inkSurfaceTensionMilliNPerM: 28, substrateSurfaceEnergyMilliNPerM: 50.36 })
 */
export function wettingMargin(input: {
  inkSurfaceTensionMilliNPerM: number;
  substrateSurfaceEnergyMilliNPerM: number;
  requiredMarginMilliNPerM?: number;
}): { marginMilliNPerM: number; ok: boolean } {
  const ink = requirePositive('inkSurfaceTensionMilliNPerM', input.inkSurfaceTensionMilliNPerM);
  const substrate = requirePositive(
    'substrateSurfaceEnergyMilliNPerM',
    input.substrateSurfaceEnergyMilliNPerM,
  );
  const required = requireNonNegative(
    'requiredMarginMilliNPerM',
    input.requiredMarginMilliNPerM ?? DEFAULT_WETTING_MARGIN_MILLI_N_PER_M,
  );
  const marginMilliNPerM = substrate - ink;
  return { marginMilliNPerM, ok: marginMilliNPerM >= required };
}
