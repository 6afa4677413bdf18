import type { CheckSummary } from '@tracewright/shared';

import { CheckStatusWord } from './check-status-word';

/** The three counts side by side: "2 Blocked · 1 Warning · 14 Pass". */
export function CheckCounts({ summary }: { summary: CheckSummary }) {
  return (
    <p className="tabular flex flex-wrap items-center gap-x-4 gap-y-1">
      <span className="inline-flex items-center gap-1">
        {summary.blocked} <CheckStatusWord status="blocked" />
      </span>
      <span className="inline-flex items-center gap-1">
        {summary.warning} <CheckStatusWord status="warning" />
      </span>
      <span className="inline-flex items-center gap-1">
        {summary.pass} <CheckStatusWord status="pass" />
      </span>
    </p>
  );
}
