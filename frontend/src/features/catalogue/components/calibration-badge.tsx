import type { HeatSourceView } from '@tracewright/shared';

import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

type CalibrationState = HeatSourceView['status']['state'];

const LOOK: Record<CalibrationState, { tone: StatusTone; label: string }> = {
  overdue: { tone: 'blocked', label: 'Overdue' },
  'due-soon': { tone: 'warning', label: 'Due soon' },
  ok: { tone: 'pass', label: 'OK' },
  'not-tracked': { tone: 'neutral', label: 'Not tracked' },
};

/** Calibration status as icon + word; the server judged it for today in the lab's calendar. */
export function CalibrationBadge({ state }: { state: CalibrationState }) {
  const { tone, label } = LOOK[state];
  return <StatusBadge tone={tone} label={label} />;
}
