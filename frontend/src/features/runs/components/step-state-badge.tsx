import type { StepRecordView } from '@tracewright/shared';

import type { IconName } from '../../../components/icons/icon-paths';
import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

const LOOK: Record<StepRecordView['state'], { label: string; tone: StatusTone; icon: IconName }> = {
  pending: { label: 'Not started', tone: 'neutral', icon: 'paused' },
  'in-progress': { label: 'In progress', tone: 'info', icon: 'hourglass' },
  done: { label: 'Done', tone: 'pass', icon: 'check' },
  'not-done': { label: 'Not done', tone: 'blocked', icon: 'blocked' },
};

export function StepStateBadge({ state }: { state: StepRecordView['state'] }) {
  const { label, tone, icon } = LOOK[state];
  return <StatusBadge tone={tone} label={label} icon={icon} />;
}
