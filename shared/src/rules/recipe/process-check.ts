import { z } from 'zod';

/** Families of process checks, in the order the checks panel lists them. */
export const CHECK_FAMILIES = [
  'references',
  'channel-plan',
  'jettability',
  'wetting',
  'line-continuity',
  'heat',
  'cure-dose',
  'sequence',
  'trace-resistance',
] as const;
export const CheckFamilySchema = z.enum(CHECK_FAMILIES);
export type CheckFamily = z.infer<typeof CheckFamilySchema>;

export const CHECK_STATUSES = ['pass', 'warning', 'blocked'] as const;
export const CheckStatusSchema = z.enum(CHECK_STATUSES);
export type CheckStatus = z.infer<typeof CheckStatusSchema>;

/**
 * One live process check of a recipe version: the builder's panel lists them, and a refused
 * release (422) carries them. `id` is stable across keystrokes (family, step id and a qualifier),
 * so a list can keep focus and animate changes.
 */
export const ProcessCheckSchema = z.object({
  /** e.g. "jettability:print-ag-1", "heat:cure-1:print-substrate", "cure-dose:ink-7". */
  id: z.string().min(1),
  family: CheckFamilySchema,
  /** The step the check is about; null for the version setup or the recipe as a whole. */
  stepId: z.string().nullable(),
  status: CheckStatusSchema,
  title: z.string(),
  /** The key figures with units, e.g. "Z = 6.78 (window 1 < Z < 10), We = 12.2 (needs > 4)". */
  numbers: z.string(),
  /** One plain sentence a technician can act on, citing the source where it matters. */
  why: z.string(),
});
export type ProcessCheck = z.infer<typeof ProcessCheckSchema>;

export const CheckSummarySchema = z.object({
  pass: z.number().int().nonnegative(),
  warning: z.number().int().nonnegative(),
  blocked: z.number().int().nonnegative(),
  /** True when any check is blocked: the version cannot be released as it stands. */
  isBlocked: z.boolean(),
});
export type CheckSummary = z.infer<typeof CheckSummarySchema>;

/**
 * Counts of each status, and whether anything blocks release.
 *
 * @example
 * checkSummary([{ status: 'pass', … }, { status: 'warning', … }, { status: 'pass', … }])
 * // → { pass: 2, warning: 1, blocked: 0, isBlocked: false }
 */
export function checkSummary(checks: readonly Pick<ProcessCheck, 'status'>[]): CheckSummary {
  let pass = 0;
  let warning = 0;
  let blocked = 0;
  for (const check of checks) {
    if (check.status === 'pass') pass += 1;
    else if (check.status === 'warning') warning += 1;
    else blocked += 1;
  }
  return { pass, warning, blocked, isBlocked: blocked > 0 };
}
