import { z } from 'zod';

import { formatNumber as f } from '../../process/units';
import type { HeatSource } from '../../schemas/equipment.schema';
import type { Solvent } from '../../schemas/ghs.schema';
import type { Ink } from '../../schemas/material.schema';
import type { RecipeStep } from '../../schemas/recipe-step.schema';
import { hazardStatement, PICTOGRAM_NAMES } from '../ghs-statements';
import { heatExposureOf } from './heat-exposure';

export const SafetyNoteSchema = z.object({
  /** Stable code, e.g. "hot-surface", "ghs:64-17-5", "sds"; the run view keys acknowledgements on it. */
  code: z.string(),
  text: z.string(),
  severity: z.enum(['caution', 'danger']),
});
export type SafetyNote = z.infer<typeof SafetyNoteSchema>;

/**
 * Heat steps from 50 °C carry a hot-surface caution: common practice, informed by the contact-burn
 * thresholds of ISO 13732-1 (about 51 °C for a one-minute touch; that value is from memory).
 */
export const HOT_SURFACE_FROM_C = 50;

/**
 * Nanoparticle heuristic (ours, no source): a conductive ink whose name or notes mention silver
 * or nanoparticles. It can miss inks (copper, carbon nanotubes) and the SDS decides.
 */
const NANOPARTICLE_WORDS = /silver|nanoparticle/i;

// Codes whose hazard is breathed in: the step needs moving air. Flammable liquids: no ignition sources.
const INHALED = /^H(33[256])$/;
const FLAMMABLE = /^H22[456]$/;

type Context = { inks: readonly Ink[]; heatSources: readonly HeatSource[] };

function solventNote(solvent: Solvent): SafetyNote | null {
  if (solvent.hazardCodes.length === 0 && solvent.pictograms.length === 0) return null;
  const statements = solvent.hazardCodes.map(hazardStatement).join('; ');
  const pictograms = solvent.pictograms.map((p) => `${p} ${PICTOGRAM_NAMES[p]}`).join(', ');
  const parts = [statements, pictograms && `pictograms ${pictograms}`, solvent.signalWord && `signal word ${solvent.signalWord}`].filter(Boolean);
  const cas = solvent.casNumber ? ` (CAS ${solvent.casNumber})` : '';
  return { code: `ghs:${solvent.casNumber ?? solvent.name.toLowerCase()}`, text: `${solvent.name}${cas}: ${parts.join('; ')}.`, severity: solvent.signalWord === 'Danger' ? 'danger' : 'caution' };
}

const note = (code: string, text: string): SafetyNote => ({ code, text, severity: 'caution' });

// What a person reads says how sure a figure is in plain words; the source markers stay here.
const NOTES = {
  // Burn thresholds after ISO 13732-1 (≈51 °C for a 1-minute contact): values from memory, not yet checked against the standard.
  hotSurface: (t: number) => note('hot-surface', `Hot surface at ${f(t)} °C: skin burns on contact from about 51 °C held for a minute, and faster the hotter it is (approximate thresholds after ISO 13732-1; the standard has the exact ones); wear heat-resistant gloves and let parts cool before handling.`),
  hotPlaten: (t: number) => note('hot-platen', `Hot platen at ${f(t)} °C: a brief touch burns; keep hands clear of the platens, use heat-resistant gloves, and lay parts down to cool after peeling.`),
  pinch: note('pinch-crush', 'Pinch and crush: keep fingers out from between the platens while the press closes and opens.'),
  solderFume: note('solder-fume', 'Solder fume: flux smoke irritates the airways; solder under fume extraction and keep your face out of the plume.'),
  hotIron: (t: number | null) => note('hot-iron', `Hot iron${t === null ? '' : ` at ${f(t)} °C`}: park it in its stand between joints and never touch the tip or barrel.`),
  // Common practice, no source.
  nanoparticle: (name: string) => note('nanoparticle', `Nanoparticle ink (${name}): wear nitrile gloves, keep it off skin, and wipe spills up wet rather than letting them dry to dust; the ink's safety data sheet says more.`),
  ventilation: note('ventilation', 'Ventilate: work where extraction draws the vapour away from you, and keep solvent containers closed between uses.'),
  noIgnition: note('no-ignition', 'Flammable vapour: keep hot plates, heat guns and sparks away until the solvent has evaporated.'),
  sds: note('sds', 'These notes come from our records: defer to the safety data sheet of each solvent and ink, and to local rules, wherever they say more.'),
};

function heatNotes(step: RecipeStep, context: Context): SafetyNote[] {
  const heat = heatExposureOf(step, 0);
  const sourceId = heat?.heatSourceId ?? null;
  const source = sourceId === null ? undefined : context.heatSources.find((h) => h.id === sourceId);
  const isPress = step.kind === 'transfer' || source?.kind === 'heat-press';
  const isSolder = step.kind === 'attach-parts' && step.params.method === 'low-temp-solder';
  const notes: SafetyNote[] = [];
  if (isSolder) notes.push(NOTES.solderFume, NOTES.hotIron(step.params.temperatureC));
  if (!heat || heat.tempC < HOT_SURFACE_FROM_C) return isPress ? [NOTES.pinch, ...notes] : notes;
  if (isPress) return [NOTES.pinch, NOTES.hotPlaten(heat.tempC), ...notes];
  return isSolder ? notes : [NOTES.hotSurface(heat.tempC), ...notes];
}

function solventNotes(solvents: readonly Solvent[], alwaysVentilate: boolean): SafetyNote[] {
  const notes = solvents.map(solventNote).filter((n): n is SafetyNote => n !== null);
  const codes = solvents.flatMap((s) => s.hazardCodes.map((c) => c.toUpperCase()));
  if (alwaysVentilate || codes.some((c) => INHALED.test(c))) notes.push(NOTES.ventilation);
  if (codes.some((c) => FLAMMABLE.test(c))) notes.push(NOTES.noIgnition);
  return notes;
}

/**
 * Cautions a step carries by what it does: heat from 50 °C (hot surface; a heat press adds pinch
 * and hot-platen cautions instead), the GHS hazard statements and pictograms of a print pass's ink
 * solvents or a solvent wipe's solvent (with ventilation and ignition cautions as they apply), a
 * nanoparticle caution for silver or nanoparticle conductors, fume and hot-iron cautions for
 * low-temperature solder. Wherever solvents or a nanoparticle ink appear, the last note defers
 * to the safety data sheet.
 *
 * @example
 * // a solvent wipe with isopropanol (H225, H319, H336; GHS02, GHS07; Danger)
 * derivedSafetyNotes(wipeStep, { inks: [], heatSources: [] }).map((n) => n.code)
 * // → ['ghs:67-63-0', 'ventilation', 'no-ignition', 'sds']
 */
export function derivedSafetyNotes(step: RecipeStep, context: Context): SafetyNote[] {
  const notes = heatNotes(step, context);
  let defersToSds = false;
  if (step.kind === 'print-pass') {
    const ink = context.inks.find((i) => i.id === step.params.inkId);
    if (ink) {
      notes.push(...solventNotes(ink.solvents, false));
      const isNano = ink.function === 'conductor' && NANOPARTICLE_WORDS.test(`${ink.name} ${ink.notes}`);
      if (isNano) notes.push(NOTES.nanoparticle(ink.name));
      defersToSds = ink.solvents.length > 0 || isNano;
    }
  }
  if (step.kind === 'surface-treatment' && step.params.method === 'solvent-wipe') {
    notes.push(...solventNotes(step.params.solvent ? [step.params.solvent] : [], true));
    defersToSds = true;
  }
  if (defersToSds) notes.push(NOTES.sds);
  const seen = new Set<string>();
  return notes.filter((n) => !seen.has(n.code) && seen.add(n.code));
}
