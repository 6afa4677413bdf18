import type { Trend } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { StatusBadge } from '../../../components/ui/status-badge';
import { formatDateTime } from '../../../lib/format-date';
import { figureText } from '../utils/trend-text';
import type { PointNoteMode } from './point-note-dialog';

const CELL = 'border-t border-graphite-200 px-2 py-1 align-top';
const CODE = `${CELL} whitespace-nowrap tabular`;

type TrendPointRowProps = {
  point: Trend['points'][number];
  position: number;
  rules: string[] | undefined;
  canEdit: boolean;
  onNote: (mode: PointNoteMode) => void;
};

export function TrendPointRow({ point, position, rules, canEdit, onNote }: TrendPointRowProps) {
  return (
    <tr>
      <th scope="row" className={`${CELL} text-right tabular`}>
        {position}
      </th>
      <td className={CODE}>{point.runCode}</td>
      <td className={CODE}>{point.pieceCode ?? '—'}</td>
      <td className={`${CELL} text-right tabular font-bold`}>{figureText(point.value)}</td>
      <td className={CODE}>{formatDateTime(point.recordedAt)}</td>
      <td className={CELL}>
        {point.excluded ? <StatusBadge tone="neutral" label="Excluded" /> : <StatusBadge tone="pass" label="Included" />}
        {rules ? <StatusBadge tone="blocked" icon="warning" label="Rule break" /> : null}
      </td>
      <td className={CELL}>{point.annotation ?? ''}</td>
      {canEdit ? (
        <td className={`${CELL} print:hidden`}>
          <div className="flex flex-wrap gap-x-3">
            <Button variant="quiet" onClick={() => onNote(point.excluded ? 'include' : 'exclude')}>
              {point.excluded ? 'Include' : 'Exclude'}{' '}
              <span className="sr-only">point {position}</span>
            </Button>
            <Button variant="quiet" onClick={() => onNote('annotate')}>
              Note <span className="sr-only">on point {position}</span>
            </Button>
          </div>
        </td>
      ) : null}
    </tr>
  );
}
