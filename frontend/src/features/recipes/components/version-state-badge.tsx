import type { VersionState } from '@tracewright/shared';

import type { IconName } from '../../../components/icons/icon-paths';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';
import { VERSION_STATE_LABELS } from '../utils/step-labels';

const LOOK: Record<VersionState, { tone: StatusTone; icon: IconName }> = {
  draft: { tone: 'neutral', icon: 'pencil' },
  'in-review': { tone: 'info', icon: 'hourglass' },
  released: { tone: 'pass', icon: 'check' },
  retired: { tone: 'neutral', icon: 'archive' },
};

/** A version's state as icon and word ("Draft", "In review", "Released", "Retired"). */
export function VersionStateBadge({ state }: { state: VersionState }) {
  const { tone, icon } = LOOK[state];
  return <StatusBadge tone={tone} icon={icon} label={VERSION_STATE_LABELS[state]} />;
}
