// SVG presentation attributes cannot read CSS variables, so the theme tokens are repeated here:
// graphite for data and axes, oxide-700 for control limits and rule breaks, verdigris-700 for the
// specification, copper for the histogram bars. Lines also differ by dash, never by colour alone.
export const CHART_COLOURS = {
  axis: '#3c4146',
  grid: '#d7d8d9',
  data: '#1d2023',
  excluded: '#686e74',
  centre: '#3c4146',
  control: '#a63420',
  spec: '#1d6a56',
  signal: '#a63420',
  bar: '#de9a68',
  barEdge: '#864518',
  paper: '#ffffff',
};

/** Dashes per kind of line: solid centre, long dashes for control limits, dash-dot for the spec. */
export const LINE_DASH = { centre: undefined, control: '8 4', spec: '2 3 8 3' } as const;

/** A short, readable number for ticks and line labels: 4 significant figures, no trailing zeros. */
export function chartNumber(value: number): string {
  return String(Number(value.toPrecision(4)));
}
