import type { JettabilityResult } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { VERDICT_LABELS } from '../utils/verdict-labels';

/** The library's verdict as icon and words, then every reason it gave, each naming its source. */
export function JettingVerdict({ result }: { result: JettabilityResult | null }) {
  if (!result) return null;
  const { tone, label } = VERDICT_LABELS[result.verdict];
  return (
    <div className="flex flex-col gap-2">
      <p className="flex flex-wrap items-center gap-2">
        <span className="font-bold text-graphite-700">Verdict</span>
        <StatusBadge tone={tone} label={label} />
      </p>
      <ul aria-label="Reasons" className="list-disc space-y-1 pl-5 text-graphite-800">
        {result.reasons.map((reason) => (
          <li key={reason}>{reason}</li>
        ))}
      </ul>
    </div>
  );
}
