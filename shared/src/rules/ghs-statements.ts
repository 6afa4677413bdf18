import type { GhsPictogram } from '../schemas/ghs.schema';

/**
 * Hazard statement wording for the codes our labs meet most (UN GHS Annex 3 texts; CLP uses the
 * same). Codes not listed are shown as the code alone with a pointer to the SDS.
 */
export const HAZARD_STATEMENTS: Record<string, string> = {
  H224: 'Extremely flammable liquid and vapour',
  H225: 'Highly flammable liquid and vapour',
  H226: 'Flammable liquid and vapour',
  H302: 'Harmful if swallowed',
  H304: 'May be fatal if swallowed and enters airways',
  H312: 'Harmful in contact with skin',
  H315: 'Causes skin irritation',
  H317: 'May cause an allergic skin reaction',
  H318: 'Causes serious eye damage',
  H319: 'Causes serious eye irritation',
  H332: 'Harmful if inhaled',
  H335: 'May cause respiratory irritation',
  H336: 'May cause drowsiness or dizziness',
  H351: 'Suspected of causing cancer',
  H360: 'May damage fertility or the unborn child',
  H361: 'Suspected of damaging fertility or the unborn child',
  H370: 'Causes damage to organs',
  H371: 'May cause damage to organs',
  H372: 'Causes damage to organs through prolonged or repeated exposure',
  H373: 'May cause damage to organs through prolonged or repeated exposure',
  H400: 'Very toxic to aquatic life',
  H410: 'Very toxic to aquatic life with long lasting effects',
  H411: 'Toxic to aquatic life with long lasting effects',
  H412: 'Harmful to aquatic life with long lasting effects',
};

/** What each pictogram code stands for (GHS pictogram names; code numbers recalled from memory). */
export const PICTOGRAM_NAMES: Record<GhsPictogram, string> = {
  GHS01: 'Exploding bomb (explosive)',
  GHS02: 'Flame (flammable)',
  GHS03: 'Flame over circle (oxidiser)',
  GHS04: 'Gas cylinder (gas under pressure)',
  GHS05: 'Corrosion (corrosive)',
  GHS06: 'Skull and crossbones (acute toxicity)',
  GHS07: 'Exclamation mark (harmful, irritant)',
  GHS08: 'Health hazard (serious long-term effects)',
  GHS09: 'Environment (aquatic toxicity)',
};

/** Readable caution lines for a hazard code, e.g. "H225 — Highly flammable liquid and vapour". */
export function hazardStatement(code: string): string {
  const text = HAZARD_STATEMENTS[code.toUpperCase()];
  return text ? `${code.toUpperCase()} — ${text}` : `${code.toUpperCase()} — see the safety data sheet`;
}
