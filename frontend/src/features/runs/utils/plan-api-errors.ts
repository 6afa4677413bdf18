import { z } from 'zod';

import { EQUIPMENT_KINDS, type PlanRunInput, type ProcessCheck } from '@tracewright/shared';

import { isApiError } from '../../../lib/api-error';
import { blockingChecksOf } from './blocking-checks';
import type { ChoicePaths } from './plan-form-values';

const UNEXPECTED = 'Something went wrong on our side. Try again; if it keeps happening, tell your admin.';
const PLAIN_FIELDS = ['quantity', 'dueOn', 'notes'];

/** Issues a refusal may name: the lots and machines that need a reason (as `missingReasons` gives them). */
const IssuesSchema = z.object({
  issues: z.array(z.object({ kind: z.enum(['lot', ...EQUIPMENT_KINDS]), id: z.number(), message: z.string() })),
});
const FlatSchema = z.object({ formErrors: z.array(z.string()).default([]), fieldErrors: z.record(z.string(), z.array(z.string()).optional()) });

export type PlacedPlanError = { fields: { path: string; message: string }[]; root: string | null; checks: ProcessCheck[] };
type Sent = { input: Pick<PlanRunInput, 'lots' | 'equipment'>; paths: ChoicePaths };

function issuePath(issue: { kind: string; id: number }, { input, paths }: Sent): string | null {
  const index =
    issue.kind === 'lot'
      ? input.lots.findIndex((l) => l.lotId === issue.id)
      : input.equipment.findIndex((e) => e.kind === issue.kind && e.id === issue.id);
  const base = issue.kind === 'lot' ? paths.lots[index] : paths.equipment[index];
  return base === undefined ? null : `${base}.reason`;
}

// Dotted keys such as "lots.1.reason" or "equipment.0.id" name an entry of the request.
function fieldPath(key: string, { paths }: Sent): string | null {
  if (PLAIN_FIELDS.includes(key)) return key;
  const match = /^(lots|equipment)\.(\d+)(?:\.(\w+))?$/.exec(key);
  const base = match ? paths[match[1] as keyof ChoicePaths][Number(match[2])] : undefined;
  if (!match || base === undefined) return null;
  if (match[3] === 'reason' || base.startsWith('instruments.')) return `${base}.reason`;
  return base.startsWith('lots.') ? `${base}.lotId` : `${base}.id`;
}

/**
 * Where the API's answer to a refused plan belongs: field messages under their fields (a lot's
 * or machine's reason, quantity, due date), blocking checks in their list, the rest at the top.
 */
export function placePlanError(error: unknown, sent: Sent): PlacedPlanError {
  if (!isApiError(error)) return { fields: [], root: UNEXPECTED, checks: [] };
  const fields: PlacedPlanError['fields'] = [];
  const leftOver: string[] = [];
  const flat = FlatSchema.safeParse(error.details);
  if (flat.success) {
    leftOver.push(...flat.data.formErrors);
    for (const [key, messages] of Object.entries(flat.data.fieldErrors)) {
      if (!messages?.length) continue;
      const path = fieldPath(key, sent);
      if (path) fields.push({ path, message: messages.join(' ') });
      else leftOver.push(...messages);
    }
  }
  // The issues repeat what the field errors say; they only fill places the field errors left empty.
  const issues = IssuesSchema.safeParse(error.details);
  for (const issue of issues.success ? issues.data.issues : []) {
    const path = issuePath(issue, sent);
    if (path && !fields.some((f) => f.path === path)) fields.push({ path, message: issue.message });
    else if (!path && !flat.success) leftOver.push(issue.message);
  }
  const checks = error.status === 422 ? blockingChecksOf(error.details) : [];
  const root = leftOver.length > 0 ? leftOver.join(' ') : fields.length === 0 || checks.length > 0 ? error.message : null;
  return { fields, root, checks };
}
