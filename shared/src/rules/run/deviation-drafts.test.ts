import { describe, expect, it } from 'vitest';

import { DEVIATION_RULES } from '../../schemas/run.schema';
import { makeReadingSpec } from '../recipe/test-fixtures';
import { DEFAULT_DEVIATION_SEVERITY, deviationDraft, type DeviationContexts } from './deviation-drafts';

const dry = { number: 4, title: 'Dry silver' };
const inspect = { number: 7, title: 'Inspect heater' };
const spec = makeReadingSpec({ name: 'Trace resistance', upperLimit: 9.5 });

// Every case lists words and numbers the draft must carry (the inputs are invented run data).
const CASES: { [R in (typeof DEVIATION_RULES)[number]]: { context: DeviationContexts[R]; says: string[] } } = {
  'reading-out-of-limits': {
    context: { step: inspect, spec, value: 11.56, correctedValue: 10, correctedTo: 20, pieceCode: 'R-2026-0007-03' },
    says: ['Trace resistance out of limits at step 7 “Inspect heater”, piece R-2026-0007-03', 'within ≤ 9.5 Ω', 'Read 11.56 Ω (10 Ω corrected to 20 °C'],
  },
  'timer-ended-early': { context: { step: dry, elapsedMinutes: 7.5, minMinutes: 10 }, says: ['step 4 “Dry silver”', 'At least 10 min', 'after 7.5 min, 2.5 min short'] },
  'timer-over-maximum': { context: { step: dry, elapsedMinutes: 18, maxMinutes: 15, reason: 'Oven door jammed.' }, says: ['At most 15 min', 'Ran 18 min, 3 min over', 'Oven door jammed.'] },
  'cure-dose-short': {
    // REFERENCES §5.1 three-step profile: 16.948 min at 150 °C; against an invented 20-min reference → 84.74 %
    context: { step: { number: 9, title: 'Cure' }, inkName: 'Silver ink', equivalentMinutes: 16.948, referenceMinutes: 20, referenceTempC: 150, percent: 84.74 },
    says: ['Silver ink cure dose short', 'At least 20 min equivalent at 150 °C', '16.9 min equivalent', '84.7 % of the reference'],
  },
  'expired-lot': { context: { lotNumber: 'AG-118', materialName: 'Silver ink', expiresOn: '2026-11-30', usedOn: '2026-12-02' }, says: ['Expired lot AG-118', 'by its expiry date, 2026-11-30', 'used on 2026-12-02'] },
  'lot-past-pot-life': {
    context: { lotNumber: 'AG-118', materialName: 'Silver ink', openedOn: '2026-11-28', potLifeHours: 72, usedOn: '2026-12-02', reason: 'Viscosity re-checked.' },
    says: ['past its pot life', 'within 72 h of opening (opened 2026-11-28)', 'Reason given: Viscosity re-checked.'],
  },
  'calibration-overdue': { context: { equipmentName: 'Oven A', dueOn: '2026-12-01', usedOn: '2026-12-02' }, says: ['Oven A used past its calibration date', 'Calibrated by 2026-12-01', 'Used on 2026-12-02'] },
  'treatment-wait-exceeded': {
    context: { treatment: { number: 2, title: 'Plasma' }, print: { number: 3, title: 'Print silver' }, waitedMinutes: 75, maxMinutes: 60 },
    says: ['step 3 “Print silver”', 'within 60 min of step 2 “Plasma”', 'started 75 min after', '15 min late'],
  },
  'step-not-done': { context: { step: inspect, reason: 'Meter broken; readings taken next shift.' }, says: ['Step 7 “Inspect heater” not done', 'Reason given: Meter broken'] },
  reported: { context: { step: dry, description: 'Film curled at one corner.', severity: 'critical' }, says: ['Problem reported at step 4 “Dry silver”', 'Film curled at one corner.'] },
};

describe('deviationDraft', () => {
  it.each(DEVIATION_RULES.map((rule) => ({ rule })))('when the rule is $rule, then the draft carries its words and numbers', ({ rule }) => {
    const { context, says } = CASES[rule];
    const draft = deviationDraft(rule, context as never);
    const text = `${draft.title} | ${draft.expected} | ${draft.actual}`;
    for (const words of says) expect(text).toContain(words);
    expect(draft.rule).toBe(rule);
  });

  it.each(DEVIATION_RULES.filter((r) => r !== 'reported').map((rule) => ({ rule })))('when the rule is $rule, then the severity is its documented default', ({ rule }) => {
    expect(deviationDraft(rule, CASES[rule].context as never).severity).toBe(DEFAULT_DEVIATION_SEVERITY[rule]);
  });

  it.each([
    { rule: 'cure-dose-short', severity: 'major' },
    { rule: 'reading-out-of-limits', severity: 'major' },
    { rule: 'timer-ended-early', severity: 'minor' },
  ] as const)('when the rule is $rule, then it opens as $severity (common practice, no source)', ({ rule, severity }) => {
    expect(DEFAULT_DEVIATION_SEVERITY[rule]).toBe(severity);
  });

  it.each([
    { severity: 'critical' as const, expected: 'critical' },
    { severity: undefined, expected: 'minor' },
  ])('when a problem is reported with severity $severity, then the draft is $expected', ({ severity, expected }) => {
    expect(deviationDraft('reported', { step: null, description: 'Smudge.', severity }).severity).toBe(expected);
  });

  it('when a reading was judged raw, then the draft does not mention a correction', () => {
    const draft = deviationDraft('reading-out-of-limits', { step: inspect, spec, value: 12, correctedValue: null, correctedTo: null });
    expect(draft.actual).toBe('Read 12 Ω.');
  });

  it('when no reason was given, then the draft does not invent one', () => {
    const draft = deviationDraft('expired-lot', CASES['expired-lot'].context);
    expect(draft.actual).not.toContain('Reason');
  });
});
