import { Link } from 'react-router';

import { Icon } from '../../../components/icons/icon';
import { buttonClasses } from '../../../components/ui/button-styles';

/** Where a run record leads: the tablet view, its printouts, and its readings as a spreadsheet. */
export function RecordLinks({ runId }: { runId: number }) {
  return (
    <>
      <Link to={`/run/${runId}`} className={buttonClasses('primary')}>
        Open on tablet
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
