import type { DeviationDetail } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';
import { RULE_WORDS } from '../utils/deviation-looks';
import { DeviationStateBadge } from './deviation-state-badge';
import { SeverityBadge } from './severity-badge';

/** Severity, state and who holds it: the first things a reviewer reads. */
export function DeviationFacts({ deviation }: { deviation: DeviationDetail }) {
  return (
    <dl className="mb-6 grid grid-cols-[auto_1fr] gap-x-6 gap-y-2 sm:grid-cols-[auto_1fr_auto_1fr]">
      <dt className="font-bold">Severity</dt>
      <dd>
        <SeverityBadge severity={deviation.severity} />
      </dd>
      <dt className="font-bold">State</dt>
      <dd>
        <DeviationStateBadge state={deviation.state} />
      </dd>
      <dt className="font-bold">Raised by</dt>
      <dd>
        {RULE_WORDS[deviation.rule]}
        {deviation.createdBy ? `, ${deviation.createdBy.name}` : ' (automatic)'}
      </dd>
      <dt className="font-bold">Raised at</dt>
      <dd className="tabular">{formatDateTime(deviation.createdAt)}</dd>
      <dt className="font-bold">Assignee</dt>
      <dd>{deviation.assignee?.name ?? 'Nobody yet'}</dd>
    </dl>
  );
}
