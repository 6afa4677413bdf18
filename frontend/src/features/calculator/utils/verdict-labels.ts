import type { JettingVerdict } from '@tracewright/shared';

import type { StatusTone } from '../../../components/ui/status-badge';

/** Words and tone for the library's jetting verdicts; the reasons beside them say why. */
export const VERDICT_LABELS: Record<JettingVerdict, { tone: StatusTone; label: string }> = {
  jettable: { tone: 'pass', label: 'Jettable' },
  'too-viscous': { tone: 'blocked', label: 'Too viscous to form drops' },
  satellites: { tone: 'warning', label: 'Satellite drops likely' },
  'no-ejection': { tone: 'blocked', label: 'Too slow to leave the nozzle' },
  splashing: { tone: 'warning', label: 'Splashing likely on impact' },
};
