import type { z } from 'zod';

import type { JettabilityResultSchema } from '@tracewright/shared';

import type { StatusTone } from '../../../components/ui/status-badge';

export type JettingVerdict = z.infer<typeof JettabilityResultSchema>['verdict'];

/** The verdict the server gave, in a technician's words, with the tone its badge takes. */
export const VERDICT_WORDS: Record<JettingVerdict, { label: string; tone: StatusTone }> = {
  jettable: { label: 'Jettable', tone: 'pass' },
  'too-viscous': { label: 'Too viscous to form drops', tone: 'blocked' },
  satellites: { label: 'Satellite drops likely', tone: 'warning' },
  'no-ejection': { label: 'Will not eject', tone: 'blocked' },
  splashing: { label: 'Splashing likely', tone: 'warning' },
};
