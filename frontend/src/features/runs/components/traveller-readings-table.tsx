import type { RunDetail, TravellerReading } from '@tracewright/shared';

const HEAD = 'border border-graphite-900 px-2 py-1 text-left font-bold';
const CELL = 'border border-graphite-900 px-2 py-1 align-top';
const BLANK = 'h-9 min-w-28 border border-graphite-900';

type TravellerReadingsTableProps = { caption: string; readings: TravellerReading[]; pieces: RunDetail['pieces'] };

/** One row per reading (per piece when the spec asks), with blank cells for the value and initials. */
export function TravellerReadingsTable({ caption, readings, pieces }: TravellerReadingsTableProps) {
  const rows = readings.flatMap((reading) =>
    reading.perPiece ? pieces.map((piece) => ({ reading, piece: piece.code })) : [{ reading, piece: 'Whole run' }],
  );
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-1 text-left font-bold">{caption}</caption>
      <thead>
        <tr>
          <th scope="col" className={HEAD}>Reading</th>
          <th scope="col" className={HEAD}>Limits</th>
          <th scope="col" className={HEAD}>Piece</th>
          <th scope="col" className={HEAD}>Value</th>
          <th scope="col" className={HEAD}>Initials</th>
        </tr>
      </thead>
      <tbody>
        {rows.map(({ reading, piece }) => (
          <tr key={`${reading.id}-${piece}`} className="break-inside-avoid">
            <th scope="row" className={`${CELL} text-left`}>
              {reading.name}
              {reading.required ? '' : ' (optional)'}
            </th>
            <td className={`${CELL} tabular`}>
              {reading.limitsText}
              {reading.targetText ? <span className="block text-graphite-700">{reading.targetText}</span> : null}
            </td>
            <td className={`${CELL} font-mono`}>{piece}</td>
            <td className={BLANK}>
              <span className="sr-only">blank, to fill in</span>
              <span className="float-right pr-1 text-graphite-700" aria-hidden="true">{reading.unit}</span>
            </td>
            <td className={BLANK} />
          </tr>
        ))}
      </tbody>
    </table>
  );
}
