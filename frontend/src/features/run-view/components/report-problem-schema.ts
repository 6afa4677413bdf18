import { z } from 'zod';

import { ReportProblemInputSchema } from '@tracewright/shared';

/** The form's part of the shared problem report (photos travel beside it, through the outbox). */
export const ReportProblemFormSchema = z.object({
  description: ReportProblemInputSchema.shape.description,
  severity: ReportProblemInputSchema.shape.severity,
  aboutStep: z.boolean(),
  pieceIds: z.array(z.string()),
});
export type ReportProblemForm = z.infer<typeof ReportProblemFormSchema>;

export const SEVERITY_CHOICES = [
  { value: 'minor', label: 'Minor', help: 'Looks wrong, parts are probably fine.' },
  { value: 'major', label: 'Major', help: 'Parts may be bad; quality should look before they go on.' },
  { value: 'critical', label: 'Critical', help: 'Unsafe, or the run cannot go on.' },
] as const;
