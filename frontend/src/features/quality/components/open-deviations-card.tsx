import { Link } from 'react-router';

import { DEVIATION_SEVERITIES, type QualityDashboard } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { SEVERITY_LOOK } from '../utils/deviation-looks';
import { deviationSearchFor } from '../utils/deviation-search';
import { DashboardCard } from './dashboard-card';

const NOT_CLOSED = ['open', 'in-review', 'dispositioned'] as const;
const AGES = [
  { key: 'underDay', label: 'Under a day' },
  { key: 'underWeek', label: 'Under a week' },
  { key: 'older', label: 'A week or older' },
] as const;

/** Deviations not yet closed (open, in review or dispositioned), counted by severity (each a link to the queue) and by age. */
export function OpenDeviationsCard({ dashboard }: { dashboard: QualityDashboard }) {
  return (
    <DashboardCard title="Deviations not yet closed">
      <ul className="flex flex-col gap-2">
        {[...DEVIATION_SEVERITIES].reverse().map((severity) => (
          <li key={severity}>
            <Link
              to={{ pathname: '/deviations', search: deviationSearchFor({ state: [...NOT_CLOSED], severity: [severity] }) }}
              className="flex min-h-11 items-center gap-3 font-bold text-copper-700 underline underline-offset-4 hover:text-copper-800"
            >
              <Icon name={SEVERITY_LOOK[severity].icon} />
              <span className="tabular text-2xl text-graphite-900">{dashboard.openBySeverity[severity] ?? 0}</span>
              {SEVERITY_LOOK[severity].label}
            </Link>
          </li>
        ))}
      </ul>
      <h3 className="font-bold">By age</h3>
      <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1">
        {AGES.map((age) => (
          <div key={age.key} className="contents">
            <dt>{age.label}</dt>
            <dd className="text-right tabular font-bold">{dashboard.openByAge[age.key]}</dd>
          </div>
        ))}
      </dl>
    </DashboardCard>
  );
}
