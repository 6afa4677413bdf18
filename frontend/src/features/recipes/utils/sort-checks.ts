import type { CheckStatus, ProcessCheck } from '@tracewright/shared';

const ORDER: Record<CheckStatus, number> = { blocked: 0, warning: 1, pass: 2 };

/**
 * Blocked first, then warnings, then passes; within a status the rules' own order (family, then step).
 * @example sortChecks([pass, blocked, warning]).map((c) => c.status) // → ['blocked', 'warning', 'pass']
 */
export function sortChecks(checks: readonly ProcessCheck[]): ProcessCheck[] {
  return checks
    .map((check, i) => ({ check, i }))
    .sort((a, b) => ORDER[a.check.status] - ORDER[b.check.status] || a.i - b.i)
    .map(({ check }) => check);
}
