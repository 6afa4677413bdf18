import type { DeviationSummary } from '@tracewright/shared';

import type { IconName } from '../../../components/icons/icon-paths';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

const LOOK: Record<DeviationSummary['state'], { label: string; tone: StatusTone; icon: IconName }> = {
  open: { label: 'Open', tone: 'warning', icon: 'warning' },
  'in-review': { label: 'In review', tone: 'info', icon: 'hourglass' },
  dispositioned: { label: 'Dispositioned', tone: 'neutral', icon: 'ledger' },
  closed: { label: 'Closed', tone: 'pass', icon: 'check' },
};

export function DeviationStateBadge({ state }: { state: DeviationSummary['state'] }) {
  const { label, tone, icon } = LOOK[state];
  return <StatusBadge tone={tone} label={label} icon={icon} />;
}
