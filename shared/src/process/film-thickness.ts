import { CUBIC_MICROMETRES_PER_PICOLITRE } from './constants';
import { requireInRange, requirePositive } from './input-guards';

/**
 * Solids volume fraction from a mass fraction: φv = (w/ρs) / (w/ρs + (1 − w)/ρc).
 *
 * @example
 * // 20 wt % silver (10 490 kg/m³) in a 1000 kg/m³ carrier → 0.023280
 * solidsVolumeFraction({ solidsWtPercent: 20, solidsDensityKgPerM3: 10490, carrierDensityKgPerM3: 1000 })
 */
export function solidsVolumeFraction(input: {
  solidsWtPercent: number;
  solidsDensityKgPerM3: number;
  carrierDensityKgPerM3: number;
}): number {
  const w = requireInRange('solidsWtPercent', input.solidsWtPercent, 0, 100) / 100;
  const solids = w / requirePositive('solidsDensityKgPerM3', input.solidsDensityKgPerM3);
  const carrier = (1 - w) / requirePositive('carrierDensityKgPerM3', input.carrierDensityKgPerM3);
  return solids / (solids + carrier);
}

/**
 * Film thickness of an area fill on a square drop grid: wet = V / p², dry = wet × φv.
 * Dry is the dense-equivalent thickness; a porous film is thicker by 1 / packing fraction.
 *
 * @example
 * // 10 pL drops at 25.4 µm (1000 dpi), φv = 0.02328 → { wetUm: 15.50, dryUm: 0.3608 }
 * filmThicknessUm({ dropVolumePl: 10, dropSpacingUm: 25.4, solidsVolumeFraction: 0.02328 })
 */
export function filmThicknessUm(input: {
  dropVolumePl: number;
  dropSpacingUm: number;
  solidsVolumeFraction: number;
}): { wetUm: number; dryUm: number } {
  const volumeUm3 =
    requirePositive('dropVolumePl', input.dropVolumePl) * CUBIC_MICROMETRES_PER_PICOLITRE;
  const p = requirePositive('dropSpacingUm', input.dropSpacingUm);
  const phi = requireInRange('solidsVolumeFraction', input.solidsVolumeFraction, 0, 1);
  const wetUm = volumeUm3 / (p * p);
  return { wetUm, dryUm: wetUm * phi };
}
