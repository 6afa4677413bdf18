import { formatNumber as f } from '../../process/units';
import type { ReadingSpec } from '../../schemas/recipe-step.schema';
import type { DEVIATION_SEVERITIES, DeviationRule } from '../../schemas/run.schema';
import { readingLimitsText } from './reading-evaluation';
import { numberText, quantityText, stepRefText, type StepRef } from './text-format';

type Severity = (typeof DEVIATION_SEVERITIES)[number];

/**
 * Severity an automatic deviation opens with; quality may change it when they review it.
 * Common practice, no source — our reasoning: what changes the product where nobody can see it
 * yet (under-cure, a reading out of limits, expired or over-aged material, a treated surface that
 * has faded, a step skipped) is major; a timer off its window or a measuring device past its
 * date is minor, because the effect is usually small and shows up in the readings that follow.
 * "reported" opens with the severity the reporter picked; 'minor' only when none is given.
 */
export const DEFAULT_DEVIATION_SEVERITY: Record<DeviationRule, Severity> = {
  'reading-out-of-limits': 'major',
  'timer-ended-early': 'minor',
  'timer-over-maximum': 'minor',
  'cure-dose-short': 'major',
  'expired-lot': 'major',
  'lot-past-pot-life': 'major',
  'calibration-overdue': 'minor',
  'treatment-wait-exceeded': 'major',
  'step-not-done': 'major',
  reported: 'minor',
};

/** What each rule needs to say what was expected and what happened, in plain words. */
export interface DeviationContexts {
  'reading-out-of-limits': {
    step: StepRef;
    spec: Pick<ReadingSpec, 'name' | 'unit' | 'lowerLimit' | 'upperLimit'>;
    value: number;
    /** From evaluateReading: the value judged, when it was corrected to a reference temperature. */
    correctedValue: number | null;
    correctedTo: number | null;
    pieceCode?: string | null;
  };
  'timer-ended-early': { step: StepRef; elapsedMinutes: number; minMinutes: number };
  'timer-over-maximum': { step: StepRef; elapsedMinutes: number; maxMinutes: number; reason?: string | null };
  'cure-dose-short': {
    step: StepRef;
    inkName: string;
    equivalentMinutes: number;
    referenceMinutes: number;
    referenceTempC: number;
    percent: number;
  };
  'expired-lot': { lotNumber: string; materialName: string; expiresOn: string; usedOn: string; reason?: string | null };
  'lot-past-pot-life': {
    lotNumber: string;
    materialName: string;
    openedOn: string;
    potLifeHours: number;
    usedOn: string;
    reason?: string | null;
  };
  'calibration-overdue': { equipmentName: string; dueOn: string; usedOn: string; reason?: string | null };
  'treatment-wait-exceeded': { treatment: StepRef; print: StepRef; waitedMinutes: number; maxMinutes: number };
  'step-not-done': { step: StepRef; reason: string };
  reported: { step: StepRef | null; description: string; severity?: Severity };
}

export interface DeviationDraft {
  rule: DeviationRule;
  severity: Severity;
  title: string;
  expected: string;
  actual: string;
}

type Words = Omit<DeviationDraft, 'rule' | 'severity'>;
const because = (reason: string | null | undefined) => (reason ? ` Reason given: ${reason}` : '');

const WORDS: { [R in DeviationRule]: (c: DeviationContexts[R]) => Words } = {
  'reading-out-of-limits': (c) => {
    const piece = c.pieceCode ? `, piece ${c.pieceCode}` : '';
    const corrected =
      c.correctedValue === null ? '' : ` (${quantityText(c.correctedValue, c.spec.unit)} corrected to ${numberText(c.correctedTo ?? 20)} °C, the value judged)`;
    return {
      title: `${c.spec.name} out of limits at ${stepRefText(c.step)}${piece}`,
      expected: `${c.spec.name} within ${readingLimitsText(c.spec)}.`,
      actual: `Read ${quantityText(c.value, c.spec.unit)}${corrected}.`,
    };
  },
  'timer-ended-early': (c) => ({
    title: `Timer ended early at ${stepRefText(c.step)}`,
    expected: `At least ${f(c.minMinutes)} min.`,
    actual: `Stopped after ${f(c.elapsedMinutes)} min, ${f(c.minMinutes - c.elapsedMinutes)} min short.`,
  }),
  'timer-over-maximum': (c) => ({
    title: `Timer over its maximum at ${stepRefText(c.step)}`,
    expected: `At most ${f(c.maxMinutes)} min.`,
    actual: `Ran ${f(c.elapsedMinutes)} min, ${f(c.elapsedMinutes - c.maxMinutes)} min over.${because(c.reason)}`,
  }),
  'cure-dose-short': (c) => ({
    title: `${c.inkName} cure dose short at ${stepRefText(c.step)}`,
    expected: `At least ${f(c.referenceMinutes)} min equivalent at ${f(c.referenceTempC)} °C (the ink's reference cure).`,
    actual: `${f(c.equivalentMinutes)} min equivalent at ${f(c.referenceTempC)} °C from the cure log: ${f(c.percent)} % of the reference.`,
  }),
  'expired-lot': (c) => ({
    title: `Expired lot ${c.lotNumber} used`,
    expected: `${c.materialName} used by its expiry date, ${c.expiresOn}.`,
    actual: `Lot ${c.lotNumber} used on ${c.usedOn}.${because(c.reason)}`,
  }),
  'lot-past-pot-life': (c) => ({
    title: `Lot ${c.lotNumber} used past its pot life`,
    expected: `${c.materialName} used within ${numberText(c.potLifeHours)} h of opening (opened ${c.openedOn}).`,
    actual: `Lot ${c.lotNumber} used on ${c.usedOn}.${because(c.reason)}`,
  }),
  'calibration-overdue': (c) => ({
    title: `${c.equipmentName} used past its calibration date`,
    expected: `Calibrated by ${c.dueOn}.`,
    actual: `Used on ${c.usedOn} with calibration overdue.${because(c.reason)}`,
  }),
  'treatment-wait-exceeded': (c) => ({
    title: `Too long between treatment and printing at ${stepRefText(c.print)}`,
    expected: `Printing starts within ${f(c.maxMinutes)} min of ${stepRefText(c.treatment)}.`,
    actual: `Printing started ${f(c.waitedMinutes)} min after the treatment, ${f(c.waitedMinutes - c.maxMinutes)} min late.`,
  }),
  'step-not-done': (c) => ({
    title: `Step ${c.step.number} “${c.step.title}” not done`,
    expected: 'Every step done as the recipe says.',
    actual: `Not done. Reason given: ${c.reason}`,
  }),
  reported: (c) => ({
    title: `Problem reported${c.step ? ` at ${stepRefText(c.step)}` : ''}`,
    expected: 'The run goes as the recipe says.',
    actual: c.description,
  }),
};

/**
 * A deviation in plain words and numbers for one rule: title, what the recipe or record expected,
 * what happened, and the rule's default severity (a reported problem keeps the reporter's).
 *
 * @example
 * deviationDraft('timer-ended-early', { step: { number: 4, title: 'Dry silver' }, elapsedMinutes: 7.5, minMinutes: 10 })
 * // → { rule: 'timer-ended-early', severity: 'minor', title: 'Timer ended early at step 4 “Dry silver”',
 * //     expected: 'At least 10 min.', actual: 'Stopped after 7.5 min, 2.5 min short.' }
 */
export function deviationDraft<R extends DeviationRule>(rule: R, context: DeviationContexts[R]): DeviationDraft {
  const words = WORDS[rule](context);
  const chosen = rule === 'reported' ? (context as DeviationContexts['reported']).severity : undefined;
  return { rule, severity: chosen ?? DEFAULT_DEVIATION_SEVERITY[rule], ...words };
}
