import type { Trend } from '@tracewright/shared';

import { Notice } from '../../../components/ui/notice';
import { valueText } from '../utils/trend-text';
import { CapabilityPanel } from './capability-panel';
import { FreezeLimitsForm } from './freeze-limits-form';
import { FrozenLimitsNote } from './frozen-limits-note';
import { SignalList } from './signal-list';
import { TrendCharts } from './trend-charts';
import { TrendPointsTable } from './trend-points-table';

const limitText = (value: number | null, unit: string) => (value === null ? 'none' : valueText(value, unit));

/** One reading spec of one recipe across its runs: charts, rule breaks, capability, points. */
export function TrendView({ trend, canEdit }: { trend: Trend; canEdit: boolean }) {
  const { spec, recipe } = trend;
  return (
    <div className="flex flex-col gap-8">
      <div className="flex flex-col gap-2">
        <h2 className="text-2xl font-bold">
          {recipe.code}: {spec.name}
        </h2>
        <p className="tabular">
          Target {limitText(spec.target, spec.unit)} · lower limit {limitText(spec.lowerLimit, spec.unit)} · upper limit {limitText(spec.upperLimit, spec.unit)}
        </p>
        <FrozenLimitsNote trend={trend} />
        {trend.note ? <Notice title="Note" role="note">{trend.note}</Notice> : null}
      </div>
      {trend.points.length === 0 ? (
        <p className="text-graphite-700">No readings recorded for this spec yet.</p>
      ) : (
        <>
          {trend.chart ? null : <Notice tone="warning" title="Not enough included points for control limits yet." />}
          <TrendCharts trend={trend} />
          <SignalList trend={trend} />
        </>
      )}
      <CapabilityPanel trend={trend} />
      {trend.points.length > 0 ? <TrendPointsTable trend={trend} canEdit={canEdit} /> : null}
      {canEdit && trend.points.length > 0 ? <FreezeLimitsForm trend={trend} /> : null}
    </div>
  );
}
