import { useId } from 'react';
import { LabelList, ReferenceArea, ReferenceLine, Scatter, ScatterChart, XAxis, YAxis, ZAxis } from 'recharts';

// SVG presentation attributes cannot read CSS variables, so the theme tokens are repeated here:
// verdigris-50/700 for the printable band, oxide-50/700 for "no ejection", copper-700 for the ink.
const COLOURS = {
  band: '#e7f3ee',
  bandEdge: '#1d6a56',
  noEjection: '#fbeae6',
  noEjectionEdge: '#a63420',
  point: '#864518',
  axis: '#3c4146',
  grid: '#b3b6ba',
};

const WIDTH = 460;
const HEIGHT = 320;

export type JettingWindowChartProps = {
  /** Names the picture, e.g. "Silver nano A9 through Bench printer". */
  title: string;
  point: { z: number; we: number | null };
  window: { zMin: number; zMax: number; label: string };
  /** The Weber number a drop must exceed to leave the nozzle. */
  ejectionWeber: number;
  /** The text alternative: where the point sits and what that means, in words. */
  description: string;
};

/** Whole decades around the values, so log axes get round ticks and the point never sits on an edge. */
function decades(values: number[]): { domain: [number, number]; ticks: number[] } {
  const positive = values.filter((v) => v > 0);
  const low = Math.floor(Math.log10(Math.min(...positive) / 1.5));
  const high = Math.ceil(Math.log10(Math.max(...positive) * 1.5));
  const ticks = Array.from({ length: high - low + 1 }, (_, i) => 10 ** (low + i));
  return { domain: [10 ** low, 10 ** high], ticks };
}

const tickText = (v: number) => (v >= 1 ? String(v) : v.toPrecision(1));

/**
 * The ink's point in the Z–We plane (log–log): the printable band on Z shaded, the ejection
 * threshold drawn as a dashed line with "no ejection" below it. The picture is hidden from
 * screen readers; the figure's description carries the same facts in words.
 */
export function JettingWindowChart({ title, point, window, ejectionWeber, description }: JettingWindowChartProps) {
  const captionId = useId();
  const descriptionId = useId();
  const x = decades([point.z, window.zMin, window.zMax]);
  const y = decades([point.we ?? ejectionWeber, ejectionWeber]);
  const data = point.we === null ? [] : [{ z: point.z, we: point.we }];

  return (
    <figure aria-labelledby={captionId} aria-describedby={descriptionId} className="flex flex-col gap-2">
      <figcaption id={captionId} className="font-bold">
        {title}
      </figcaption>
      <div aria-hidden="true" className="max-w-full overflow-x-auto">
        <ScatterChart width={WIDTH} height={HEIGHT} margin={{ top: 12, right: 28, bottom: 28, left: 8 }} accessibilityLayer={false}>
          <XAxis
            type="number"
            dataKey="z"
            scale="log"
            domain={x.domain}
            ticks={x.ticks}
            tickFormatter={tickText}
            allowDataOverflow
            stroke={COLOURS.axis}
            label={{ value: 'Z = 1/Oh', position: 'insideBottom', offset: -16, fill: COLOURS.axis }}
          />
          <YAxis
            type="number"
            dataKey="we"
            scale="log"
            domain={y.domain}
            ticks={y.ticks}
            tickFormatter={tickText}
            allowDataOverflow
            stroke={COLOURS.axis}
            width={56}
            label={{ value: 'We', angle: -90, position: 'insideLeft', fill: COLOURS.axis }}
          />
          <ReferenceArea y1={y.domain[0]} y2={ejectionWeber} fill={COLOURS.noEjection} fillOpacity={1} ifOverflow="hidden" />
          <ReferenceArea
            x1={window.zMin}
            x2={window.zMax}
            fill={COLOURS.band}
            fillOpacity={0.85}
            stroke={COLOURS.bandEdge}
            strokeDasharray="2 3"
            ifOverflow="hidden"
            label={{ value: `printable ${window.label}`, position: 'insideTop', fill: COLOURS.bandEdge, fontSize: 13 }}
          />
          <ReferenceLine
            y={ejectionWeber}
            stroke={COLOURS.noEjectionEdge}
            strokeDasharray="6 4"
            strokeWidth={2}
            label={{ value: `We = ${ejectionWeber}: no ejection below`, position: 'insideBottomRight', fill: COLOURS.noEjectionEdge, fontSize: 13 }}
          />
          {/* A fixed, large marker: one point, meant to be found at a glance. */}
          <ZAxis range={[220, 220]} />
          <Scatter data={data} fill={COLOURS.point} stroke="#ffffff" strokeWidth={2} shape="circle" isAnimationActive={false}>
            <LabelList dataKey="z" position="right" offset={12} formatter={() => 'this ink'} fill={COLOURS.point} fontWeight={700} />
          </Scatter>
        </ScatterChart>
      </div>
      <p id={descriptionId} className="max-w-prose text-sm text-graphite-700">
        {description}
      </p>
    </figure>
  );
}
