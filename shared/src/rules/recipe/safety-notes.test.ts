import { describe, expect, it } from 'vitest';

import type { Solvent } from '../../schemas/ghs.schema';
import type { RecipeStep } from '../../schemas/recipe-step.schema';
import { derivedSafetyNotes, HOT_SURFACE_FROM_C } from './safety-notes';
import { makeHeatSource, makeInk, steps } from './test-fixtures';

// Solvent classifications (REFERENCES §7.2): ethanol, harmonised CLP entry H225, GHS02, Danger (ECHA C&L);
// ethylene glycol, UN GHS per ICSC 0270: harmful if swallowed, may damage organs → H302, H373, GHS07, GHS08, Warning.
const ETHANOL: Solvent = { name: 'Ethanol', casNumber: '64-17-5', hazardCodes: ['H225'], pictograms: ['GHS02'], signalWord: 'Danger' };
const GLYCOL: Solvent = { name: 'Ethylene glycol', casNumber: '107-21-1', hazardCodes: ['H302', 'H373'], pictograms: ['GHS07', 'GHS08'], signalWord: 'Warning' };
// Invented inks (fixtures): the names drive the nanoparticle heuristic.
const inks = [
  makeInk({ id: 1, name: 'Silver flake ink', solvents: [GLYCOL] }),
  makeInk({ id: 2, name: 'Cover ink', function: 'dielectric', solvents: [ETHANOL] }),
  makeInk({ id: 3, name: 'Carbon paste', notes: 'nanoparticle carbon black' }),
  makeInk({ id: 4, name: 'Carbon paste', solvents: [] }),
];
const context = { inks, heatSources: [makeHeatSource(), makeHeatSource({ id: 2, kind: 'heat-press', name: 'Press' })] };
const codes = (step: RecipeStep) => derivedSafetyNotes(step, context).map((n) => n.code);

describe('derivedSafetyNotes', () => {
  // prettier-ignore
  it.each([
    // 50 °C threshold: common practice informed by ISO 13732-1 (≈51 °C for 1 min contact, from memory)
    { name: 'a cure at 150 °C', step: steps.cure('c', { temperatureC: 150 }), expected: ['hot-surface'] },
    { name: 'a dry at exactly 50 °C', step: steps.dry('d', { temperatureC: HOT_SURFACE_FROM_C }), expected: ['hot-surface'] },
    { name: 'a dry at 45 °C', step: steps.dry('d', { temperatureC: 45 }), expected: [] },
    { name: 'a heat-press transfer at 150 °C', step: steps.transfer('t', { temperatureC: 150 }), expected: ['pinch-crush', 'hot-platen'] },
    { name: 'a dry on the heat press', step: steps.dry('d', { temperatureC: 120, heatSourceId: 2 }), expected: ['pinch-crush', 'hot-platen'] },
    { name: 'low-temperature solder at 170 °C', step: steps.attach('a', { method: 'low-temp-solder', temperatureC: 170 }), expected: ['solder-fume', 'hot-iron'] },
    { name: 'z-axis tape', step: steps.attach('a'), expected: [] },
    { name: 'a silver print with ethylene glycol', step: steps.print('p', { inkId: 1 }), expected: ['ghs:107-21-1', 'nanoparticle', 'sds'] },
    { name: 'a dielectric print with ethanol', step: steps.print('p', { inkId: 2 }), expected: ['ghs:64-17-5', 'no-ignition', 'sds'] },
    { name: 'a nanoparticle conductor named so in its notes', step: steps.print('p', { inkId: 3 }), expected: ['nanoparticle', 'sds'] },
    { name: 'a conductor that mentions neither silver nor nanoparticles', step: steps.print('p', { inkId: 4 }), expected: [] },
    { name: 'a print on a 60 °C platen with ethanol ink', step: steps.print('p', { inkId: 2, platenTempC: 60 }), expected: ['hot-surface', 'ghs:64-17-5', 'no-ignition', 'sds'] },
    { name: 'an ethanol wipe', step: steps.treatment('w', { method: 'solvent-wipe', solvent: ETHANOL }), expected: ['ghs:64-17-5', 'ventilation', 'no-ignition', 'sds'] },
    { name: 'a wipe with no solvent named', step: steps.treatment('w', { method: 'solvent-wipe' }), expected: ['ventilation', 'sds'] },
    { name: 'a plasma treatment', step: steps.treatment('t'), expected: [] },
  ])('when the step is $name, then the notes are $expected', ({ step, expected }) => {
    expect(codes(step)).toEqual(expected);
  });

  it('when a solvent carries hazard codes, then the note spells out the statements, pictograms and signal word', () => {
    const [note] = derivedSafetyNotes(steps.treatment('w', { method: 'solvent-wipe', solvent: ETHANOL }), context);
    expect(note).toEqual({
      code: 'ghs:64-17-5',
      severity: 'danger',
      text: 'Ethanol (CAS 64-17-5): H225 — Highly flammable liquid and vapour; pictograms GHS02 Flame (flammable); signal word Danger.',
    });
  });

  it('when the signal word is Warning, then the note is a caution', () => {
    expect(derivedSafetyNotes(steps.print('p', { inkId: 1 }), context)[0]?.severity).toBe('caution');
  });

  it('when solvents appear, then the last note defers to the safety data sheet', () => {
    const notes = derivedSafetyNotes(steps.print('p', { inkId: 2 }), context);
    expect(notes.at(-1)?.text).toContain('defer to the safety data sheet');
  });

  it('when a heat note is made, then it names the temperature and says the burn values are approximate and where the exact ones are', () => {
    const [note] = derivedSafetyNotes(steps.cure('c', { temperatureC: 150 }), context);
    expect(note?.text).toContain('150 °C');
    // ISO 13732-1 (REFERENCES.md 7.4): ≈51 °C for a 1-minute contact, recalled, not checked against the standard.
    expect(note?.text).toContain('about 51 °C held for a minute');
    expect(note?.text).toContain('approximate thresholds after ISO 13732-1; the standard has the exact ones');
  });
});
