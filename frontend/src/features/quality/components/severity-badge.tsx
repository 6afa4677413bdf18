import type { DeviationDetail } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { SEVERITY_LOOK } from '../utils/deviation-looks';

export function SeverityBadge({ severity }: { severity: DeviationDetail['severity'] }) {
  const { label, tone, icon } = SEVERITY_LOOK[severity];
  return <StatusBadge tone={tone} label={label} icon={icon} />;
}
