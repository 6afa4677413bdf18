import type { RunState } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { RUN_STATE_LOOK } from '../utils/run-state-look';

export function RunStateBadge({ state }: { state: RunState }) {
  const { label, tone, icon } = RUN_STATE_LOOK[state];
  return <StatusBadge tone={tone} label={label} icon={icon} />;
}
