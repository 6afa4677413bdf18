/** Surface-tension components of a liquid, mN/m (OWRK dispersive/polar split). */
export interface SurfaceComponents {
  dispersiveMilliNPerM: number;
  polarMilliNPerM: number;
}

export interface ProbeLiquid extends SurfaceComponents {
  readonly name: string;
  readonly totalMilliNPerM: number;
  /** Where the split comes from; the split differs between sources, so a record must keep it. */
  readonly source: string;
}

/**
 * Water, 72.8 = 21.8 dispersive + 51.0 polar mN/m at about 20 °C. Widely used set; its usual
 * attribution to Ström, Fredriksson & Stenius 1987 is from memory (paper not checked).
 */
export const WATER_PROBE: ProbeLiquid = {
  name: 'water',
  totalMilliNPerM: 72.8,
  dispersiveMilliNPerM: 21.8,
  polarMilliNPerM: 51.0,
  source: 'Ström, Fredriksson & Stenius 1987 (attribution from memory)',
};

/**
 * Diiodomethane, 50.8 mN/m, treated as fully dispersive (polar 0). Same attribution caveat as water.
 */
export const DIIODOMETHANE_PROBE: ProbeLiquid = {
  name: 'diiodomethane',
  totalMilliNPerM: 50.8,
  dispersiveMilliNPerM: 50.8,
  polarMilliNPerM: 0,
  source: 'Ström, Fredriksson & Stenius 1987 (attribution from memory)',
};

/** The probe pair `owrkSurfaceEnergy` uses. */
export const OWRK_PROBE_LIQUIDS = {
  water: WATER_PROBE,
  diiodomethane: DIIODOMETHANE_PROBE,
} as const;
