import type { RunState } from '@tracewright/shared';

import type { IconName } from '../../../components/icons/icon-paths';
import type { StatusTone } from '../../../components/ui/status-badge';

/** How each run state reads: its word first, an icon beside it, the colour only repeating them. */
export const RUN_STATE_LOOK: Record<RunState, { label: string; tone: StatusTone; icon: IconName }> = {
  planned: { label: 'Planned', tone: 'neutral', icon: 'ledger' },
  'in-progress': { label: 'In progress', tone: 'info', icon: 'hourglass' },
  'on-hold': { label: 'On hold', tone: 'warning', icon: 'paused' },
  completed: { label: 'Completed', tone: 'pass', icon: 'check' },
  closed: { label: 'Closed', tone: 'neutral', icon: 'archive' },
  cancelled: { label: 'Cancelled', tone: 'blocked', icon: 'close' },
};
