import { useId } from 'react';
import { ReferenceLine, Scatter, ScatterChart, XAxis, YAxis, ZAxis } from 'recharts';

import { ICON_PATHS } from '../icons/icon-paths';
import { CHART_COLOURS, chartNumber, LINE_DASH } from './chart-colours';
import { useChartWidth } from './use-chart-width';

export type ControlChartPoint = { x: number; y: number; isExcluded: boolean; isSignal: boolean };
export type ControlChartLine = { y: number; label: string; kind: keyof typeof LINE_DASH };

export type ControlChartProps = {
  title: string;
  /** The text alternative: what the chart shows, in words (the points are also listed in a table). */
  description: string;
  points: ControlChartPoint[];
  lines: ControlChartLine[];
  xLabel: string;
  yLabel: string;
  height?: number;
  /** Moving ranges start at zero; individuals float around their data. */
  startsAtZero?: boolean;
};

type ShapeProps = { cx?: number; cy?: number };

/** A rule break is marked with the same warning glyph the app uses everywhere, on a white disc. */
function SignalMark({ cx = 0, cy = 0 }: ShapeProps) {
  return (
    <g transform={`translate(${cx - 11} ${cy - 11})`} className="control-chart-signal">
      <circle cx={11} cy={11} r={12} fill={CHART_COLOURS.paper} />
      <g transform="scale(0.92)" fill="none" stroke={CHART_COLOURS.signal} strokeWidth={2.4} strokeLinecap="round" strokeLinejoin="round">
        {ICON_PATHS.warning.map((d) => (
          <path key={d} d={d} />
        ))}
      </g>
    </g>
  );
}

/** An excluded point stays visible but hollow and struck through: it no longer counts. */
function ExcludedMark({ cx = 0, cy = 0 }: ShapeProps) {
  return (
    <g className="control-chart-excluded" stroke={CHART_COLOURS.excluded} strokeWidth={2}>
      <circle cx={cx} cy={cy} r={5} fill={CHART_COLOURS.paper} />
      <path d={`M${cx - 7} ${cy + 7}L${cx + 7} ${cy - 7}`} />
    </g>
  );
}

/**
 * A control chart in time order: the included points joined by a line, excluded points hollow,
 * rule breaks marked with a warning glyph, and the centre, control and specification lines named
 * at their right end. The picture is hidden from screen readers; the description says the same.
 */
export function ControlChart({ title, description, points, lines, xLabel, yLabel, height = 300, startsAtZero = false }: ControlChartProps) {
  const captionId = useId();
  const descriptionId = useId();
  const { ref, width } = useChartWidth<HTMLDivElement>(720);
  const included = points.filter((p) => !p.isExcluded);
  const xMax = Math.max(2, ...points.map((p) => p.x));

  return (
    <figure aria-labelledby={captionId} aria-describedby={descriptionId} className="flex flex-col gap-2 break-inside-avoid">
      <figcaption id={captionId} className="font-bold">
        {title}
      </figcaption>
      <div ref={ref} aria-hidden="true" className="w-full">
        <ScatterChart width={width} height={height} margin={{ top: 12, right: 96, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <XAxis type="number" dataKey="x" domain={[1, xMax]} allowDecimals={false} stroke={CHART_COLOURS.axis} label={{ value: xLabel, position: 'insideBottom', offset: -16, fill: CHART_COLOURS.axis }} />
          <YAxis type="number" dataKey="y" domain={[startsAtZero ? 0 : 'auto', 'auto']} tickFormatter={chartNumber} stroke={CHART_COLOURS.axis} width={64} label={{ value: yLabel, angle: -90, position: 'insideLeft', fill: CHART_COLOURS.axis }} />
          <ZAxis range={[48, 48]} />
          {lines.map((line) => (
            <ReferenceLine
              key={`${line.kind}-${line.label}`}
              y={line.y}
              stroke={CHART_COLOURS[line.kind]}
              strokeWidth={line.kind === 'centre' ? 1.5 : 2}
              strokeDasharray={LINE_DASH[line.kind]}
              ifOverflow="extendDomain"
              // Spec labels sit inside on the left, control labels outside on the right, so a UCL
              // next to a USL never writes over it.
              label={{ value: `${line.label} ${chartNumber(line.y)}`, position: line.kind === 'spec' ? 'insideBottomLeft' : 'right', fill: CHART_COLOURS[line.kind], fontSize: 13 }}
            />
          ))}
          <Scatter data={included} fill={CHART_COLOURS.data} line={{ stroke: CHART_COLOURS.data, strokeWidth: 1.5 }} shape="circle" isAnimationActive={false} />
          <Scatter data={points.filter((p) => p.isExcluded)} shape={ExcludedMark} isAnimationActive={false} />
          <Scatter data={included.filter((p) => p.isSignal)} shape={SignalMark} isAnimationActive={false} />
        </ScatterChart>
      </div>
      <p id={descriptionId} className="max-w-prose text-sm text-graphite-700">
        {description}
      </p>
    </figure>
  );
}
