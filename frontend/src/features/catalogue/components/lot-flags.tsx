import type { LotView } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';

/** A lot's flags as icon + word; the server worked them out for today in the lab's calendar. */
export function LotFlags({ status }: { status: LotView['status'] }) {
  if (status.flags.length === 0) return <StatusBadge tone="pass" label="Usable" />;
  return (
    <span className="inline-flex flex-wrap gap-1.5">
      {status.flags.map((flag) =>
        flag === 'expired' ? (
          <StatusBadge key={flag} tone="blocked" label="Expired" />
        ) : (
          <StatusBadge key={flag} tone="blocked" label="Past pot life" icon="hourglass" />
        ),
      )}
    </span>
  );
}
