import type { QualityDashboard } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { TextLink } from '../../../components/ui/text-link';
import { DashboardCard } from './dashboard-card';

type Specs = QualityDashboard['lowCapability'];

/** Reading specs whose Cpk (from the API) is under 1.33, each opening its trend. */
export function LowCapabilityCard({ specs }: { specs: Specs }) {
  return (
    <DashboardCard title="Capability below 1.33">
      {specs.length === 0 ? (
        <p className="text-graphite-700">Every reading spec with enough points has Cpk of 1.33 or more.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {specs.map((s) => (
            <li key={`${s.recipeId}-${s.specId}`} className="flex flex-wrap items-center gap-2">
              <TextLink to={`/trends?recipeId=${s.recipeId}&specId=${encodeURIComponent(s.specId)}`}>
                {s.recipeCode}: {s.specName}
              </TextLink>
              <StatusBadge tone="warning" label={`Cpk ${s.cpk.toFixed(2)}`} />
              <span className="text-sm text-graphite-700 tabular">{s.n} points</span>
            </li>
          ))}
        </ul>
      )}
    </DashboardCard>
  );
}
