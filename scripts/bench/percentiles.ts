/** The q-th percentile (0–100) of samples, nearest-rank method. */
export function percentile(samples: readonly number[], q: number): number {
  if (samples.length === 0) return Number.NaN;
  const sorted = [...samples].sort((a, b) => a - b);
  const rank = Math.ceil((q / 100) * sorted.length);
  return sorted[Math.min(sorted.length, Math.max(1, rank)) - 1] as number;
}

export const median = (samples: readonly number[]) => percentile(samples, 50);
