import { z } from 'zod';

import { ProcessCheckSchema, type ProcessCheck } from '@tracewright/shared';

const DetailsSchema = z.object({ checks: z.array(ProcessCheckSchema) });

/** The blocking checks a refused plan (422) carries in its details, if any. */
export function blockingChecksOf(details: unknown): ProcessCheck[] {
  const parsed = DetailsSchema.safeParse(details);
  return parsed.success ? parsed.data.checks.filter((c) => c.status === 'blocked') : [];
}
