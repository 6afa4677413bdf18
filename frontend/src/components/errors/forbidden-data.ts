import { z } from 'zod';

import { RoleSchema } from '@tracewright/shared';

/** What a role guard throws with its 403, so the error page can name the roles that may enter. */
export const ForbiddenDataSchema = z.object({ allowed: z.array(RoleSchema), current: RoleSchema.optional() });
export type ForbiddenData = z.infer<typeof ForbiddenDataSchema>;
