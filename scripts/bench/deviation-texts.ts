import { pick } from './bulk-insert';

// Demo data only: invented but plausible deviation wording for the fictional lab, so the queue's
// text search meets the kind of words quality staff type (ink names, "Ag", defects, machines).

const DEFECTS = [
  ['Silver smear across the key gap', 'Clean gaps between keys', 'Ag smear bridging keys 2 and 3 near the tail'],
  ['Ag bridge between neighbouring traces', 'No conductive path between traces', 'Bridge of silver about 0.3 mm wide, shorts keys 1 and 2'],
  ['Nozzle dropout on the Ag conductor channel', 'Every nozzle firing', 'Three missing lines across the print, channel Ag conductor'],
  ['PET sheet curled after the cure', 'Flat sheet', 'Corner lifted 4 mm off the shelf after the oven'],
  ['Connector tail lifted at one end', 'Tail bonded along the pads', 'Z-axis tape lifted on pads 5 and 6'],
  ['Ink puddling at a trace corner', 'Even line width', 'Bulge at the corner, line twice as wide there'],
  ['Scratch across a cured trace', 'Unbroken traces', 'Scratch through key 4 trace, open circuit'],
  ['Dust under the print', 'Clean substrate', 'Two dust specks under the dielectric cover'],
  ['Cover misaligned over the pads', 'Connector pads left bare', 'Cover ink overlaps pad 1 by about 0.5 mm'],
  ['Cracked trace after bending', 'No cracks at 10 mm radius', 'Hairline crack across the heater trace at the fold'],
] as const;

export interface DeviationText {
  title: string;
  expected: string;
  actual: string;
}

/** Wording for a deviation of `rule`, varied by the generator. */
export function deviationText(random: () => number, rule: string, pieceCode: string): DeviationText {
  const value = (8 + random() * 8).toFixed(1);
  switch (rule) {
    case 'reading-out-of-limits':
      return { title: `Key 4 trace resistance out of limits on ${pieceCode}`, expected: '5–12 Ω', actual: `${value} Ω (${(Number(value) * 0.97).toFixed(1)} Ω at 20 °C)` };
    case 'timer-over-maximum':
      return { title: 'Hot plate dry ran over its maximum', expected: '5–10 min at 60 °C', actual: `${Math.round(11 + random() * 9)} min on the hot plate` };
    case 'timer-ended-early':
      return { title: 'Hot plate dry stopped early', expected: '5–10 min at 60 °C', actual: `${Math.round(1 + random() * 3)} min on the hot plate` };
    case 'cure-dose-short':
      return { title: 'Silver cure dose short', expected: 'Full dose at 110 °C for 200 min', actual: `Oven log shows ${Math.round(120 + random() * 60)} min at temperature` };
    case 'expired-lot':
      return { title: 'Silver ink lot used after its expiry date', expected: 'Lot within its expiry date', actual: `Lot QS30-${2600 + Math.round(random() * 20)} expired before the run` };
    case 'lot-past-pot-life':
      return { title: 'Ink lot past its pot life', expected: 'Opened less than 24 h ago', actual: `Opened ${Math.round(26 + random() * 40)} h before printing` };
    case 'calibration-overdue':
      return { title: 'Oven calibration overdue', expected: 'Calibration current on the day of the run', actual: 'Calibration due date passed last week' };
    case 'treatment-wait-exceeded':
      return { title: 'Printed too long after the wipe', expected: 'Print within 30 min of the solvent wipe', actual: `Printed ${Math.round(35 + random() * 60)} min after the wipe` };
    case 'step-not-done':
      return { title: 'Step closed as not done', expected: 'Every step done', actual: pick(random, ['Oven busy, skipped the second cure', 'Tape out of stock', 'Sheet torn before inspection']) };
    default: {
      const [title, expected, actual] = pick(random, DEFECTS);
      return { title, expected, actual: `${actual} (${pieceCode})` };
    }
  }
}
