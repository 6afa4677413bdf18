/**
 * Round tick values across [low, high]: steps of 1, 2, 2.5 or 5 times a power of ten, about
 * `count` of them, so an axis reads 9.5, 10, 10.5 instead of 9.7, 10.14, 10.58.
 * @example niceTicks(7.8, 12.2, 6) // → [8, 9, 10, 11, 12]
 */
export function niceTicks(low: number, high: number, count: number): number[] {
  if (!(high > low) || count < 2) return [low];
  const rough = (high - low) / (count - 1);
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = ([1, 2, 2.5, 5, 10].find((m) => m * power >= rough) ?? 10) * power;
  const ticks: number[] = [];
  for (let v = Math.ceil(low / step) * step; v <= high + step * 1e-9; v += step) ticks.push(Number(v.toPrecision(12)));
  return ticks;
}
