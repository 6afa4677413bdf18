import type { StepRecordView } from '@tracewright/shared';

import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

const LOOK: Record<StepRecordView['state'], { tone: StatusTone; label: string; icon?: 'check' | 'blocked' | 'paused' | 'hourglass' }> = {
  pending: { tone: 'neutral', label: 'Not started' },
  'in-progress': { tone: 'info', label: 'In progress', icon: 'hourglass' },
  done: { tone: 'pass', label: 'Done' },
  'not-done': { tone: 'blocked', label: 'Not done' },
};

/** A step's state as icon + word. */
export function StepStateBadge({ state }: { state: StepRecordView['state'] }) {
  const look = LOOK[state];
  return <StatusBadge tone={look.tone} label={look.label} icon={look.icon} />;
}
