import { useId, type ReactNode } from 'react';

import { formatResult } from '../utils/format-result';

// A no-break space keeps the unit with its number; the degree sign is written close up, as in 117°.
const unitGap = (unit: string) => (unit === '°' ? '' : '\u00a0');

type ResultValueProps = { label: ReactNode; value: number | null | undefined; unit?: string; note?: string };

/** One result: its name, then a large tabular number with the unit in a lighter weight. Use inside a <dl>. */
export function ResultValue({ label, value, unit, note }: ResultValueProps) {
  const labelId = useId();
  return (
    <div className="flex flex-col">
      <dt id={labelId} className="text-sm font-bold text-graphite-700">
        {label}
      </dt>
      <dd aria-labelledby={labelId} className="tabular text-3xl font-bold text-graphite-900">
        {formatResult(value)}
        {unit ? <span className="text-lg font-normal text-graphite-600">{`${unitGap(unit)}${unit}`}</span> : null}
        {note ? <span className="block text-sm font-normal text-graphite-600">{` ${note}`}</span> : null}
      </dd>
    </div>
  );
}
