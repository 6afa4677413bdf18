import type { z } from 'zod';

import type { DraftContent } from '@tracewright/shared';

/**
 * The first reason a draft cannot be saved, said so a person can find it: which step (and that
 * step's id, to select it) or which part of the setup.
 * @example describeInvalid(error, steps) // → { stepId: 'cure-x1', message: 'Step 3 “Cure” has fields to fix: Temperature must be a number in °C.' }
 */
export function describeInvalid(error: z.ZodError, content: DraftContent): { stepId: string | null; message: string } {
  const issue = error.issues[0];
  if (!issue) return { stepId: null, message: 'Some fields need fixing before this can be saved.' };
  const [head, index] = issue.path;
  if (head === 'steps' && typeof index === 'number') {
    const step = content.steps[index];
    return { stepId: step?.id ?? null, message: `Step ${index + 1} “${step?.title ?? ''}” has fields to fix: ${issue.message}` };
  }
  return { stepId: null, message: `The setup has a field to fix: ${issue.message}` };
}
