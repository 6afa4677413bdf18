import { readingLimitsText, type RecipeStep, type RunDetail } from '@tracewright/shared';
import { quantityText } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { formatDateTime } from '../../../lib/format-date';
import type { ReadingRow } from '../utils/reading-rows';
import { ReadingValue } from './reading-value';

const HEAD = 'border-b border-graphite-900 bg-graphite-100 px-2 py-1 text-left font-bold print:bg-transparent';
const CELL = 'border-b border-graphite-300 px-2 py-1 align-top';

type RecordReadingsTableProps = { caption: string; step: RecipeStep; rows: ReadingRow[]; run: RunDetail };

export function RecordReadingsTable({ caption, step, rows, run }: RecordReadingsTableProps) {
  const pieceOf = (id: number | null) => (id === null ? 'Whole run' : (run.pieces.find((p) => p.id === id)?.code ?? `piece #${id}`));
  const instrumentOf = (id: number | null) => (id === null ? null : (run.instruments.find((i) => i.id === id)?.name ?? `instrument #${id}`));
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-1 text-left font-bold">{caption}</caption>
      <thead>
        <tr>
          <th scope="col" className={HEAD}>Reading</th>
          <th scope="col" className={HEAD}>Piece</th>
          <th scope="col" className={HEAD}>Value</th>
          <th scope="col" className={`${HEAD} whitespace-nowrap`}>At 20 °C</th>
          <th scope="col" className={HEAD}>Limits</th>
          <th scope="col" className={HEAD}>Result</th>
          <th scope="col" className={HEAD}>Recorded</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => {
          const { current } = row;
          const spec = step.readingSpecs.find((s) => s.id === current.specId);
          const first = row.replaced[0] ?? current;
          const instrument = instrumentOf(current.instrumentId);
          return (
            <tr key={current.id}>
              <th scope="row" className={`${CELL} text-left`}>{spec?.name ?? current.specId}</th>
              <td className={`${CELL} whitespace-nowrap font-mono`}>{pieceOf(current.pieceId)}</td>
              <td className={CELL}>
                <ReadingValue row={row} />
              </td>
              <td className={`${CELL} tabular whitespace-nowrap`}>{current.correctedValue === null ? '—' : quantityText(current.correctedValue, current.unit)}</td>
              <td className={`${CELL} tabular whitespace-nowrap`}>{spec ? readingLimitsText(spec) : '—'}</td>
              <td className={`${CELL} whitespace-nowrap`}>
                {current.outOfLimits ? <StatusBadge tone="blocked" label="Out of limits" /> : <StatusBadge tone="pass" label="In limits" />}
              </td>
              <td className={`${CELL} tabular`}>
                {formatDateTime(first.recordedAt)} {first.recordedBy ? `by ${first.recordedBy.name}` : ''}
                {row.replaced.length > 0 ? (
                  <span className="block">
                    Corrected {formatDateTime(current.recordedAt)} {current.recordedBy ? `by ${current.recordedBy.name}` : ''}
                  </span>
                ) : null}
                {instrument ? <span className="block text-graphite-700">with {instrument}</span> : null}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
