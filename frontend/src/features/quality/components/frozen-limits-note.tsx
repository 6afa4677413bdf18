import type { Trend } from '@tracewright/shared';

import { Notice } from '../../../components/ui/notice';
import { formatDateTime } from '../../../lib/format-date';
import { valueText } from '../utils/trend-text';

/** Says where the limits come from: a frozen baseline, or every included point. */
export function FrozenLimitsNote({ trend }: { trend: Trend }) {
  const { frozen, spec } = trend;
  if (!frozen) {
    return <p className="text-graphite-700">Limits are computed from every included point. Freeze them from a baseline once the process is stable.</p>;
  }
  return (
    <Notice title={`Limits frozen on ${formatDateTime(frozen.frozenAt)}`} role="note">
      <p>
        From a baseline of {frozen.baselineRunIds.length} run(s): mean {valueText(frozen.mean, spec.unit)}, σ {valueText(frozen.sigma, spec.unit)}. Reason: {frozen.reason}
      </p>
    </Notice>
  );
}
