import { z } from 'zod';

import { SignatureViewSchema } from './deviation.schema';
import { DeviationStateSchema, RunStateSchema } from './run.schema';

/**
 * What quality's signatures mean, stored with each signature. The recipe release keeps its own
 * meaning (signature.schema); these are fixed by the action, never typed by the signer.
 */
export const QUALITY_SIGNATURE_MEANINGS = {
  disposition: 'deviation dispositioned',
  close: 'deviation closed',
  runSignOff: 'run record approved',
} as const;
export type QualitySignatureMeaning = (typeof QUALITY_SIGNATURE_MEANINGS)[keyof typeof QUALITY_SIGNATURE_MEANINGS];

/** People to pick from (assignees, operators): `{ people: [{ id, name }] }`. */
export const PeopleListSchema = z.object({ people: z.array(z.object({ id: z.number().int(), name: z.string() })) });
export type PeopleList = z.infer<typeof PeopleListSchema>;

/**
 * GET/POST /api/runs/:id/sign-off: whether the run's record may be signed off now, the hash of
 * the record as it stands (send it back when signing), and the signature once given.
 */
export const RunSignOffViewSchema = z.object({
  runId: z.number().int(),
  runCode: z.string(),
  runState: RunStateSchema,
  contentHash: z.string(),
  canSignOff: z.boolean(),
  refusal: z.string().nullable(),
  undecided: z.array(z.object({ id: z.number().int(), title: z.string(), state: DeviationStateSchema })),
  signature: SignatureViewSchema.nullable(),
});
export type RunSignOffView = z.infer<typeof RunSignOffViewSchema>;

/** POST /api/deviations/digest: what the daily digest did (nothing is sent when nothing is open). */
export const DeviationDigestResultSchema = z.object({
  sent: z.boolean(),
  recipients: z.number().int(),
  openDeviations: z.number().int(),
});
export type DeviationDigestResult = z.infer<typeof DeviationDigestResultSchema>;
