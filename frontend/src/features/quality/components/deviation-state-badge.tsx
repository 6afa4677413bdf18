import type { DeviationDetail } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { STATE_LOOK } from '../utils/deviation-looks';

export function DeviationStateBadge({ state }: { state: DeviationDetail['state'] }) {
  const { label, tone, icon } = STATE_LOOK[state];
  return <StatusBadge tone={tone} label={label} icon={icon} />;
}
