import type { UserStatus } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';

export function PersonStatus({ status }: { status: UserStatus }) {
  if (status === 'active') return <StatusBadge tone="pass" label="Active" />;
  if (status === 'invited') return <StatusBadge tone="info" label="Invited" icon="envelope" />;
  return <StatusBadge tone="neutral" label="Deactivated" />;
}
