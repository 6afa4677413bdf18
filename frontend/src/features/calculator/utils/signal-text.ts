import type { RunRuleId, RunRuleSignal } from '@tracewright/shared';

const RULE_WORDS: Record<RunRuleId, string> = {
  'beyond-3-sigma': 'beyond 3σ',
  'two-of-three-beyond-2-sigma': '2 of 3 beyond 2σ',
  'four-of-five-beyond-1-sigma': '4 of 5 beyond 1σ',
  'eight-on-one-side': '8 in a row on one side of the mean',
};

/**
 * A run-rule signal in words, numbering points from 1 as the person pasted them.
 * @example signalText({ index: 6, rule: 'two-of-three-beyond-2-sigma' }) // → 'point 7: 2 of 3 beyond 2σ'
 */
export function signalText(signal: RunRuleSignal): string {
  return `point ${signal.index + 1}: ${RULE_WORDS[signal.rule]}`;
}
