import { CUBIC_MICROMETRES_PER_PICOLITRE, MICROMETRES_PER_INCH } from './constants';
import { requireContactAngleDeg, requirePositive } from './input-guards';
import { degreesToRadians } from './units';

/**
 * Drop spacing on the substrate for a printing resolution: p = 25 400 µm / dpi.
 * @example dropSpacingUm(1000) // → 25.4
 */
export function dropSpacingUm(dpi: number): number {
  return MICROMETRES_PER_INCH / requirePositive('dpi', dpi);
}

/**
 * In-flight diameter of a spherical drop: d₀ = (6V/π)^⅓, with 1 pL = 1000 µm³.
 * @example dropDiameterUm(10) // → 26.730
 */
export function dropDiameterUm(dropVolumePl: number): number {
  const volumeUm3 = requirePositive('dropVolumePl', dropVolumePl) * CUBIC_MICROMETRES_PER_PICOLITRE;
  return Math.cbrt((6 * volumeUm3) / Math.PI);
}

/**
 * Volume of a spherical drop: V = π d₀³ / 6.
 * @example dropVolumePl(30) // → 14.137
 */
export function dropVolumePl(dropDiameterUm: number): number {
  const d = requirePositive('dropDiameterUm', dropDiameterUm);
  return (Math.PI * d ** 3) / 6 / CUBIC_MICROMETRES_PER_PICOLITRE;
}

/**
 * θ/sin²θ − cosθ/sinθ (θ in radians inside): the shape factor of a circular-segment cross-section,
 * area = (w²/4)·bracket. Open range 0 < θ < 180°, where the bead has a finite width.
 * @example contactAngleBracket(45) // → π/2 − 1 = 0.57080
 */
export function contactAngleBracket(contactAngleDeg: number): number {
  const theta = degreesToRadians(requireContactAngleDeg('contactAngleDeg', contactAngleDeg, true));
  const sin = Math.sin(theta);
  return theta / (sin * sin) - Math.cos(theta) / sin;
}

/**
 * Cross-section area of a bead whose surface is a circular arc meeting the substrate at θ:
 * A = (w²/4)(θ/sin²θ − cosθ/sinθ).
 * @example beadCrossSectionAreaUm2({ widthUm: 79.01, contactAngleDeg: 30 }) // → 565.5 µm²
 */
export function beadCrossSectionAreaUm2(input: {
  widthUm: number;
  contactAngleDeg: number;
}): number {
  const w = requirePositive('widthUm', input.widthUm);
  return ((w * w) / 4) * contactAngleBracket(input.contactAngleDeg);
}

/**
 * Stable bead width of a printed line (Stringer & Derby, J. Eur. Ceram. Soc. 2009; Langmuir 2010):
 * w = √(2π d₀³ / (3p(θ/sin²θ − cosθ/sinθ))). It is volume conservation: each drop's volume fills
 * one drop spacing of a circular-segment bead. Valid only where a stable bead forms (drops
 * overlap, spacing above the bulging limit); the formula does not check that.
 *
 * @example
 * // d₀ = 30 µm (14.137 pL), p = 25 µm, θ = 30° → 79.01 µm
 * beadWidthUm({ dropVolumePl: 14.137, dropSpacingUm: 25, contactAngleDeg: 30 })
 */
export function beadWidthUm(input: {
  dropVolumePl: number;
  dropSpacingUm: number;
  contactAngleDeg: number;
}): number {
  const d0 = dropDiameterUm(input.dropVolumePl);
  const p = requirePositive('dropSpacingUm', input.dropSpacingUm);
  const bracket = contactAngleBracket(input.contactAngleDeg);
  return Math.sqrt((2 * Math.PI * d0 ** 3) / (3 * p * bracket));
}

/**
 * Footprint diameter of one drop at rest as a spherical cap of contact angle θ:
 * d_eq = d₀·[8 / (tan(θ/2)(3 + tan²(θ/2)))]^⅓.
 *
 * @example
 * // d₀ = 30 µm (14.137 pL) at 30° → 64.02 µm (spread factor 2.1341)
 * equilibriumFootprintUm({ dropVolumePl: 14.137, contactAngleDeg: 30 })
 */
export function equilibriumFootprintUm(input: {
  dropVolumePl: number;
  contactAngleDeg: number;
}): number {
  const d0 = dropDiameterUm(input.dropVolumePl);
  const theta = degreesToRadians(
    requireContactAngleDeg('contactAngleDeg', input.contactAngleDeg, true),
  );
  const t = Math.tan(theta / 2);
  return d0 * Math.cbrt(8 / (t * (3 + t * t)));
}
