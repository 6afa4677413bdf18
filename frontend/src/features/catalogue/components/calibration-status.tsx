import type { HeatSourceView } from '@tracewright/shared';

import { CalibrationBadge } from './calibration-badge';
import { DetailSection } from './detail-section';

/** Calibration today, as the server judged it in the lab's calendar, in words. */
export function CalibrationStatus({ status }: { status: HeatSourceView['status'] }) {
  return (
    <DetailSection title="Calibration">
      <p className="flex flex-wrap items-center gap-3">
        <CalibrationBadge state={status.state} />
        <span>{status.message}</span>
      </p>
    </DetailSection>
  );
}
