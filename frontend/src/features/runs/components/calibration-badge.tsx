import type { InstrumentView } from '@tracewright/shared';

import { StatusBadge, type StatusTone } from '../../../components/ui/status-badge';

type CalibrationState = InstrumentView['status']['state'];

const LOOK: Record<CalibrationState, { tone: StatusTone; label: string }> = {
  overdue: { tone: 'blocked', label: 'Calibration overdue' },
  'due-soon': { tone: 'warning', label: 'Calibration due soon' },
  ok: { tone: 'pass', label: 'Calibrated' },
  'not-tracked': { tone: 'neutral', label: 'Calibration not tracked' },
};

/** The server's judgement of a machine's calibration for today, as icon + words. */
export function CalibrationBadge({ state }: { state: CalibrationState }) {
  const { tone, label } = LOOK[state];
  return <StatusBadge tone={tone} label={label} />;
}
