import type { InkWetting } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';

/** The server's wetting judgement as icon + word. */
export function WettingVerdict({ margin }: { margin: InkWetting['margin'] }) {
  if (margin === null) return <StatusBadge tone="neutral" label="Unknown" />;
  return margin.ok ? <StatusBadge tone="pass" label="Wets" /> : <StatusBadge tone="blocked" label="Poor wetting" />;
}
