import { requireContactAngleDeg, requireNonNegative, requirePositive } from './input-guards';
import { DIIODOMETHANE_PROBE, WATER_PROBE, type SurfaceComponents } from './probe-liquids';
import { degreesToRadians, radiansToDegrees } from './units';

export interface SurfaceEnergy extends SurfaceComponents {
  totalMilliNPerM: number;
}

/**
 * Surface free energy of a solid from water and diiodomethane contact angles by OWRK
 * (Owens & Wendt 1969): γL(1 + cos θ) = 2[√(γS^d·γL^d) + √(γS^p·γL^p)] for each probe.
 * Diiodomethane has no polar part, so it fixes γS^d alone; water then gives γS^p.
 * A negative polar root (water beads more than the dispersive part explains) is reported as 0.
 *
 * @example
 * owrkSurfaceEnergy({ waterAngleDeg: 72.5, diiodomethaneAngleDeg: 27 })
 * // → { dispersiveMilliNPerM: 45.414, polarMilliNPerM: 4.945, totalMilliNPerM: 50.359 }
 */
export function owrkSurfaceEnergy(input: {
  waterAngleDeg: number;
  diiodomethaneAngleDeg: number;
}): SurfaceEnergy {
  const thetaW = degreesToRadians(requireContactAngleDeg('waterAngleDeg', input.waterAngleDeg));
  const thetaD = degreesToRadians(
    requireContactAngleDeg('diiodomethaneAngleDeg', input.diiodomethaneAngleDeg),
  );
  const w = WATER_PROBE;
  const dim = DIIODOMETHANE_PROBE;

  const rootDispersive =
    (dim.totalMilliNPerM * (1 + Math.cos(thetaD))) / (2 * Math.sqrt(dim.dispersiveMilliNPerM));
  const dispersiveMilliNPerM = rootDispersive ** 2;
  const rootPolar =
    ((w.totalMilliNPerM * (1 + Math.cos(thetaW))) / 2 -
      Math.sqrt(dispersiveMilliNPerM * w.dispersiveMilliNPerM)) /
    Math.sqrt(w.polarMilliNPerM);
  const polarMilliNPerM = rootPolar > 0 ? rootPolar ** 2 : 0;
  return {
    dispersiveMilliNPerM,
    polarMilliNPerM,
    totalMilliNPerM: dispersiveMilliNPerM + polarMilliNPerM,
  };
}

/**
 * Contact angle a liquid should make on a solid by OWRK:
 * cos θ = 2[√(γS^d·γL^d) + √(γS^p·γL^p)] / γL − 1. Returns 0 when cos θ ≥ 1 (the liquid spreads)
 * and 180 when cos θ ≤ −1.
 *
 * @example
 * // water (21.8 + 51.0) on a PTFE-like solid (18.0 + 0) → 117.12°
 * predictedContactAngleDeg({
 *   liquid: { dispersiveMilliNPerM: 21.8, polarMilliNPerM: 51.0 },
 *   solid: { dispersiveMilliNPerM: 18.0, polarMilliNPerM: 0 },
 * })
 */
export function predictedContactAngleDeg(input: {
  liquid: SurfaceComponents;
  solid: SurfaceComponents;
}): number {
  const { liquid, solid } = checkPair(input.liquid, input.solid);
  const liquidTotal = liquid.dispersiveMilliNPerM + liquid.polarMilliNPerM;
  const cosTheta = (2 * geometricMeanSum(liquid, solid)) / liquidTotal - 1;
  if (cosTheta >= 1) return 0;
  if (cosTheta <= -1) return 180;
  return radiansToDegrees(Math.acos(cosTheta));
}

/**
 * Solid–liquid interfacial tension by OWRK's geometric mean:
 * γSL = γS + γL − 2[√(γS^d·γL^d) + √(γS^p·γL^p)].
 *
 * @example
 * // water on the solid 45.414 + 4.945 mN/m → 28.468 mN/m
 * owrkInterfacialTensionMilliNPerM({
 *   liquid: { dispersiveMilliNPerM: 21.8, polarMilliNPerM: 51.0 },
 *   solid: { dispersiveMilliNPerM: 45.414, polarMilliNPerM: 4.945 },
 * })
 */
export function owrkInterfacialTensionMilliNPerM(input: {
  liquid: SurfaceComponents;
  solid: SurfaceComponents;
}): number {
  const { liquid, solid } = checkPair(input.liquid, input.solid);
  const sum = (c: SurfaceComponents) => c.dispersiveMilliNPerM + c.polarMilliNPerM;
  return sum(solid) + sum(liquid) - 2 * geometricMeanSum(liquid, solid);
}

/**
 * Work of adhesion by Young–Dupré, Wa = γL(1 + cos θ), in mJ/m² (numerically equal to mN/m).
 *
 * @example
 * workOfAdhesionMilliJPerM2({ liquidSurfaceTensionMilliNPerM: 72.8, contactAngleDeg: 72.5 }) // → 94.691
 */
export function workOfAdhesionMilliJPerM2(input: {
  liquidSurfaceTensionMilliNPerM: number;
  contactAngleDeg: number;
}): number {
  const gamma = requirePositive(
    'liquidSurfaceTensionMilliNPerM',
    input.liquidSurfaceTensionMilliNPerM,
  );
  const theta = degreesToRadians(requireContactAngleDeg('contactAngleDeg', input.contactAngleDeg));
  return gamma * (1 + Math.cos(theta));
}

function geometricMeanSum(liquid: SurfaceComponents, solid: SurfaceComponents): number {
  return (
    Math.sqrt(solid.dispersiveMilliNPerM * liquid.dispersiveMilliNPerM) +
    Math.sqrt(solid.polarMilliNPerM * liquid.polarMilliNPerM)
  );
}

function checkPair(liquid: SurfaceComponents, solid: SurfaceComponents) {
  requireNonNegative('liquid.dispersiveMilliNPerM', liquid.dispersiveMilliNPerM);
  requireNonNegative('liquid.polarMilliNPerM', liquid.polarMilliNPerM);
  // A liquid with no surface tension at all has no defined contact angle.
  requirePositive('liquid.totalMilliNPerM', liquid.dispersiveMilliNPerM + liquid.polarMilliNPerM);
  requireNonNegative('solid.dispersiveMilliNPerM', solid.dispersiveMilliNPerM);
  requireNonNegative('solid.polarMilliNPerM', solid.polarMilliNPerM);
  return { liquid, solid };
}
