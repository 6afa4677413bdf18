import { expect } from 'vitest';

// Test-only helper (not exported from index.ts): REFERENCES states its tolerances as relative ones.

/** Asserts |actual − expected| ≤ relTol·|expected|. */
export function expectRelativelyClose(
  actual: number | null,
  expected: number,
  relTol: number,
): void {
  expect(actual).not.toBeNull();
  const error = Math.abs((actual as number) - expected);
  const allowed = relTol * Math.abs(expected);
  expect(
    error,
    `expected ${String(actual)} to be within ${relTol * 100} % of ${expected}`,
  ).toBeLessThanOrEqual(allowed);
}
