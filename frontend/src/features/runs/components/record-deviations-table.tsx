import type { DeviationSummary } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';
import { DeviationStateBadge } from './deviation-state-badge';

const HEAD = 'border-b border-graphite-900 bg-graphite-100 px-2 py-1 text-left font-bold print:bg-transparent';
const CELL = 'border-b border-graphite-300 px-2 py-1 align-top';
const SEVERITY = { minor: 'Minor', major: 'Major', critical: 'Critical' } as const;

type RecordDeviationsTableProps = { caption: string; deviations: DeviationSummary[]; stepTitleOf?: (stepId: string | null) => string };

export function RecordDeviationsTable({ caption, deviations, stepTitleOf }: RecordDeviationsTableProps) {
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-1 text-left font-bold">{caption}</caption>
      <thead>
        <tr>
          <th scope="col" className={HEAD}>Deviation</th>
          {stepTitleOf ? <th scope="col" className={HEAD}>Step</th> : null}
          <th scope="col" className={HEAD}>Expected</th>
          <th scope="col" className={HEAD}>Actual</th>
          <th scope="col" className={HEAD}>Severity</th>
          <th scope="col" className={HEAD}>Status</th>
          <th scope="col" className={HEAD}>Raised</th>
        </tr>
      </thead>
      <tbody>
        {deviations.map((d) => (
          <tr key={d.id}>
            <th scope="row" className={`${CELL} text-left`}>
              <span className="tabular text-graphite-700">#{d.id}</span> {d.title}
            </th>
            {stepTitleOf ? <td className={CELL}>{stepTitleOf(d.stepId)}</td> : null}
            <td className={CELL}>{d.expected}</td>
            <td className={CELL}>{d.actual}</td>
            <td className={`${CELL} font-bold`}>{SEVERITY[d.severity]}</td>
            <td className={CELL}>
              <DeviationStateBadge state={d.state} />
            </td>
            <td className={`${CELL} tabular`}>
              {formatDateTime(d.createdAt)} {d.createdBy ? `by ${d.createdBy.name}` : '(automatic)'}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
