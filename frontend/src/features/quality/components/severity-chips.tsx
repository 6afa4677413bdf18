import { useNavigate } from 'react-router';

import { DEVIATION_SEVERITIES, type DeviationQuery } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { useLatestQuery } from '../hooks/use-latest-query';
import { SEVERITY_LOOK } from '../utils/deviation-looks';
import { deviationSearchFor, toggled } from '../utils/deviation-search';
import { ToggleChip } from './toggle-chip';

/** Severity filter: any mix of minor, major and critical, applied at once. */
export function SeverityChips({ query }: { query: DeviationQuery }) {
  const navigate = useNavigate();
  const latest = useLatestQuery(query);
  const show = (severity: DeviationQuery['severity']) => navigate({ search: deviationSearchFor({ ...latest, severity, page: 1 }) });

  return (
    <fieldset className="mb-4">
      <legend className="mb-2 font-bold">Severity</legend>
      <div className="flex flex-wrap gap-2">
        <ToggleChip isPressed={!query.severity?.length} onToggle={() => show([])}>
          Any severity
        </ToggleChip>
        {DEVIATION_SEVERITIES.map((severity) => (
          <ToggleChip key={severity} isPressed={query.severity?.includes(severity) ?? false} onToggle={() => show(toggled(latest.severity, severity))}>
            <Icon name={SEVERITY_LOOK[severity].icon} className="size-4" />
            {SEVERITY_LOOK[severity].label}
          </ToggleChip>
        ))}
      </div>
    </fieldset>
  );
}
