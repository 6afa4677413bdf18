import { Link } from 'react-router';

import { allowedRunTransitions, type RunState } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { buttonClasses } from '../../../components/ui/button-styles';

/** Where a run record leads: the tablet view, its printouts, and its readings as a spreadsheet. */
export function RecordLinks({ runId, state }: { runId: number; state: RunState }) {
  // A final run (closed, cancelled: no move left) takes no more records; the tablet can only show it.
  const isReadOnly = allowedRunTransitions(state).length === 0;
  return (
    <>
      <Link to={`/run/${runId}`} className={buttonClasses(isReadOnly ? 'secondary' : 'primary')}>
        {isReadOnly ? 'Tablet view (read only)' : 'Open on tablet'}
      </Link>
      <Link to={`/runs/${runId}/traveller`} className={buttonClasses('secondary')}>
        <Icon name="printer" />
        Traveller
      </Link>
      <Link to={`/runs/${runId}/labels`} className={buttonClasses('secondary')}>
        Piece labels
      </Link>
      {/* A plain download: the server answers with the CSV file itself. */}
      <a href={`/api/runs/${runId}/readings.csv`} download className={buttonClasses('secondary')}>
        <Icon name="outbox" />
        Readings (CSV)
      </a>
    </>
  );
}
