import { useId } from 'react';
import { ReferenceArea, ReferenceLine, ScatterChart, XAxis, YAxis } from 'recharts';

import { CHART_COLOURS, chartNumber, LINE_DASH } from './chart-colours';
import { niceTicks } from './nice-ticks';
import { useChartWidth } from './use-chart-width';

export type HistogramBin = { from: number; to: number; count: number };
export type HistogramLine = { x: number; label: string };

export type HistogramChartProps = {
  title: string;
  /** The text alternative: the spread and where it sits against the limits, in words. */
  description: string;
  bins: HistogramBin[];
  /** Specification limits (and target) drawn across the bars. */
  lines: HistogramLine[];
  xLabel: string;
  height?: number;
};

/**
 * How the values spread, as bars on a true number axis, with the specification limits drawn
 * across, so a reader sees at once how much room is left on each side.
 */
export function HistogramChart({ title, description, bins, lines, xLabel, height = 260 }: HistogramChartProps) {
  const captionId = useId();
  const descriptionId = useId();
  const { ref, width } = useChartWidth<HTMLDivElement>(720);
  const edges = [...bins.flatMap((b) => [b.from, b.to]), ...lines.map((l) => l.x)];
  const low = Math.min(...edges);
  const high = Math.max(...edges);
  const pad = (high - low || 1) * 0.05;
  const top = Math.max(1, ...bins.map((b) => b.count));
  // About one tick per 90 px, at round values, so the axis stays readable on a tablet.
  const ticks = niceTicks(low - pad, high + pad, Math.max(3, Math.floor(width / 90)));

  return (
    <figure aria-labelledby={captionId} aria-describedby={descriptionId} className="flex flex-col gap-2 break-inside-avoid">
      <figcaption id={captionId} className="font-bold">
        {title}
      </figcaption>
      <div ref={ref} aria-hidden="true" className="w-full">
        <ScatterChart width={width} height={height} margin={{ top: 28, right: 24, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <XAxis type="number" dataKey="x" domain={[low - pad, high + pad]} ticks={ticks} tickFormatter={chartNumber} allowDataOverflow stroke={CHART_COLOURS.axis} label={{ value: xLabel, position: 'insideBottom', offset: -16, fill: CHART_COLOURS.axis }} />
          <YAxis type="number" dataKey="y" domain={[0, Math.ceil(top * 1.1)]} allowDecimals={false} allowDataOverflow stroke={CHART_COLOURS.axis} width={48} label={{ value: 'Points', angle: -90, position: 'insideLeft', fill: CHART_COLOURS.axis }} />
          {bins.map((bin) =>
            bin.count > 0 ? (
              <ReferenceArea key={bin.from} className="histogram-bin" x1={bin.from} x2={bin.to} y1={0} y2={bin.count} fill={CHART_COLOURS.bar} fillOpacity={1} stroke={CHART_COLOURS.barEdge} />
            ) : null,
          )}
          {lines.map((line) => (
            <ReferenceLine
              key={line.label}
              x={line.x}
              stroke={CHART_COLOURS.spec}
              strokeWidth={2}
              strokeDasharray={LINE_DASH.spec}
              label={{ value: `${line.label} ${chartNumber(line.x)}`, position: 'top', fill: CHART_COLOURS.spec, fontSize: 13 }}
            />
          ))}
        </ScatterChart>
      </div>
      <p id={descriptionId} className="max-w-prose text-sm text-graphite-700">
        {description}
      </p>
    </figure>
  );
}
