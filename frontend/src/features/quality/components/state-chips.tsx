import { useNavigate } from 'react-router';

import { DEVIATION_STATES, type DeviationQuery } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { useLatestQuery } from '../hooks/use-latest-query';
import { STATE_LOOK } from '../utils/deviation-looks';
import { deviationSearchFor, toggled } from '../utils/deviation-search';
import { ToggleChip } from './toggle-chip';

type StateChipsProps = { query: DeviationQuery; counts: Record<string, number> };

/** How many deviations stand in each state (under the other filters); pressing one filters by it. */
export function StateChips({ query, counts }: StateChipsProps) {
  const navigate = useNavigate();
  const latest = useLatestQuery(query);
  const show = (state: DeviationQuery['state']) => navigate({ search: deviationSearchFor({ ...latest, state, page: 1 }) });

  return (
    <fieldset className="mb-4">
      <legend className="mb-2 font-bold">State</legend>
      <div className="flex flex-wrap gap-2">
        <ToggleChip isPressed={!query.state?.length} onToggle={() => show([])}>
          Any state
        </ToggleChip>
        {DEVIATION_STATES.map((state) => (
          <ToggleChip key={state} isPressed={query.state?.includes(state) ?? false} onToggle={() => show(toggled(latest.state, state))}>
            <Icon name={STATE_LOOK[state].icon} className="size-4" />
            {STATE_LOOK[state].label}{' '}
            <span className="tabular rounded-full bg-graphite-100 px-2 text-sm text-graphite-800">{counts[state] ?? 0}</span>
          </ToggleChip>
        ))}
      </div>
    </fieldset>
  );
}
