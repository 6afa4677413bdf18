import { numberText, type DeviationDetail } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { formatDateTime } from '../../../lib/format-date';
import { DetailSection } from './detail-section';

const HEAD = 'border-b border-graphite-500 px-2 py-1';
const CELL = 'border-b border-graphite-200 px-2 py-1';

/** The readings behind the deviation, each marked in or out of limits in words. */
export function DeviationReadings({ readings }: { readings: DeviationDetail['readings'] }) {
  if (readings.length === 0) return null;
  return (
    <DetailSection title="Readings">
      <table className="w-full border-collapse text-left">
        <thead>
          <tr>
            <th scope="col" className={HEAD}>Reading</th>
            <th scope="col" className={`${HEAD} text-right`}>Value</th>
            <th scope="col" className={HEAD}>Limits</th>
            <th scope="col" className={HEAD}>Recorded</th>
          </tr>
        </thead>
        <tbody>
          {readings.map((r) => (
            <tr key={r.id}>
              <th scope="row" className={`${CELL} font-normal`}>
                {r.specName}
              </th>
              <td className={`${CELL} text-right tabular`}>
                <span className="text-lg font-bold">{numberText(r.value)}</span> <span className="text-graphite-600">{r.unit}</span>
              </td>
              <td className={CELL}>{r.outOfLimits ? <StatusBadge tone="blocked" label="Out of limits" /> : <StatusBadge tone="pass" label="Within limits" />}</td>
              <td className={`${CELL} tabular`}>{formatDateTime(r.recordedAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </DetailSection>
  );
}
