/**
 * Western Electric run rules (Western Electric Statistical Quality Control Handbook, 1956, as
 * stated in Montgomery & Runger). Rules 2–3 count points on one side of the centre line at a time.
 */
export const RUN_RULE_IDS = [
  'beyond-3-sigma',
  'two-of-three-beyond-2-sigma',
  'four-of-five-beyond-1-sigma',
  'eight-on-one-side',
] as const;

export type RunRuleId = (typeof RUN_RULE_IDS)[number];

export interface RunRuleSignal {
  index: number;
  rule: RunRuleId;
}

type Side = 1 | -1;

/**
 * Points that break a Western Electric rule against a centre line and σ. Each signal sits on the
 * point that completes the pattern, and that point must itself be in the zone (so a calm point
 * after two wild ones is not blamed). "Beyond" is strict; a point on the centre line is on
 * neither side. Comparisons are in value space, so σ = 0 does not divide by zero.
 *
 * @example
 * // centre 0, σ 1: [2.5, 0, 2.5] → [{ index: 2, rule: 'two-of-three-beyond-2-sigma' }]
 * westernElectricSignals([2.5, 0, 2.5], 0, 1)
 */
export function westernElectricSignals(
  values: readonly number[],
  mean: number,
  sigma: number,
): RunRuleSignal[] {
  const beyond = (x: number, k: number, side: Side) => side * (x - mean) > k * sigma;
  const countBeyond = (end: number, size: number, k: number, side: Side) =>
    values.slice(Math.max(0, end - size + 1), end + 1).filter((x) => beyond(x, k, side)).length;

  const signals: RunRuleSignal[] = [];
  values.forEach((x, i) => {
    const side: Side = x >= mean ? 1 : -1;
    if (beyond(x, 3, side)) signals.push({ index: i, rule: 'beyond-3-sigma' });
    if (beyond(x, 2, side) && countBeyond(i, 3, 2, side) >= 2) {
      signals.push({ index: i, rule: 'two-of-three-beyond-2-sigma' });
    }
    if (beyond(x, 1, side) && countBeyond(i, 5, 1, side) >= 4) {
      signals.push({ index: i, rule: 'four-of-five-beyond-1-sigma' });
    }
    if (i >= 7 && countBeyond(i, 8, 0, side) === 8) {
      signals.push({ index: i, rule: 'eight-on-one-side' });
    }
  });
  return signals;
}
