import type { Trend } from '@tracewright/shared';

import { ControlChart } from '../../../components/charts/control-chart';
import { HistogramChart } from '../../../components/charts/histogram-chart';
import { histogramBins } from '../utils/histogram-bins';
import { individualsLines, individualsPoints, movingRangePoints } from '../utils/trend-series';
import { histogramDescription, individualsDescription, movingRangeDescription } from '../utils/trend-text';

/** The individuals and moving-range charts, then the histogram against the spec limits. */
export function TrendCharts({ trend }: { trend: Trend }) {
  const { spec, chart } = trend;
  const unitLabel = `${spec.name} (${spec.unit})`;
  const histogramLines = [
    ...(spec.lowerLimit === null ? [] : [{ x: spec.lowerLimit, label: 'LSL' }]),
    ...(spec.target === null ? [] : [{ x: spec.target, label: 'Target' }]),
    ...(spec.upperLimit === null ? [] : [{ x: spec.upperLimit, label: 'USL' }]),
  ];
  const included = trend.points.filter((p) => !p.excluded).map((p) => p.value);

  return (
    <div className="flex flex-col gap-8">
      <ControlChart title={`Individuals: ${spec.name} (${spec.unit})`} description={individualsDescription(trend)} points={individualsPoints(trend)} lines={individualsLines(trend)} xLabel="Point" yLabel={spec.unit} />
      {chart ? (
        <ControlChart
          title={`Moving range (${spec.unit})`}
          description={movingRangeDescription(trend)}
          points={movingRangePoints(trend)}
          lines={[
            { y: chart.movingRangeMean, label: 'MR̄', kind: 'centre' },
            { y: chart.movingRangeUcl, label: 'UCL', kind: 'control' },
          ]}
          xLabel="Point"
          yLabel={spec.unit}
          height={220}
          startsAtZero
        />
      ) : null}
      {included.length > 0 ? (
        <HistogramChart title="Spread against the spec limits" description={histogramDescription(trend)} bins={histogramBins(included)} lines={histogramLines} xLabel={unitLabel} />
      ) : null}
    </div>
  );
}
