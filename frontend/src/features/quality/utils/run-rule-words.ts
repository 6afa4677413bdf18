import { RUN_RULE_IDS, type RunRuleId } from '@tracewright/shared';

const WORDS: Record<RunRuleId, string> = {
  'beyond-3-sigma': 'beyond a control limit (3σ)',
  'two-of-three-beyond-2-sigma': '2 of 3 points beyond 2σ on one side',
  'four-of-five-beyond-1-sigma': '4 of 5 points beyond 1σ on one side',
  'eight-on-one-side': '8 points in a row on one side of the mean',
};

const isRunRule = (rule: string): rule is RunRuleId => (RUN_RULE_IDS as readonly string[]).includes(rule);

/** A run-rule signal's rule in words; a rule this page does not know yet is shown as sent. */
export function runRuleWords(rule: string): string {
  return isRunRule(rule) ? WORDS[rule] : rule;
}
