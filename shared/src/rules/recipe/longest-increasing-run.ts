/**
 * Positions of one longest strictly increasing subsequence (patience sorting, O(n log n)). The
 * version diff uses it to find the steps that kept their relative order.
 *
 * @example longestIncreasingRun([0, 2, 1, 3]) // → [0, 2, 3] (values 0, 1, 3)
 */
export function longestIncreasingRun(values: readonly number[]): number[] {
  const tails: number[] = []; // tails[k]: position of the smallest tail of a run of length k + 1
  const previous = new Array<number>(values.length).fill(-1);
  values.forEach((v, i) => {
    let lo = 0;
    let hi = tails.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((values[tails[mid] as number] as number) < v) lo = mid + 1;
      else hi = mid;
    }
    if (lo > 0) previous[i] = tails[lo - 1] as number;
    tails[lo] = i;
  });
  const run: number[] = [];
  for (let i = tails.length > 0 ? (tails[tails.length - 1] as number) : -1; i !== -1; i = previous[i] as number) run.push(i);
  return run.reverse();
}
