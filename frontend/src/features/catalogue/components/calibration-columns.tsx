import type { HeatSourceView } from '@tracewright/shared';

import { CalibrationBadge } from './calibration-badge';
import type { Column } from './record-table';

type Calibrated = { calibrationDueOn: string | null; status: HeatSourceView['status'] };

// Sorted ascending, what needs attention comes first.
const URGENCY = { overdue: 0, 'due-soon': 1, ok: 2, 'not-tracked': 3 } as const;

/** The two calibration columns every calibrated kind of equipment shows. */
export function calibrationColumns<T extends Calibrated>(): Column<T>[] {
  return [
    { key: 'due', label: 'Calibration due', sortValue: (r) => r.calibrationDueOn, render: (r) => <span className="tabular whitespace-nowrap">{r.calibrationDueOn ?? '—'}</span> },
    { key: 'calibration', label: 'Calibration', sortValue: (r) => URGENCY[r.status.state], render: (r) => <CalibrationBadge state={r.status.state} /> },
  ];
}
