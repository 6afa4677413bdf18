import type { QualityDashboard } from '@tracewright/shared';

import { TextLink } from '../../../components/ui/text-link';
import { formatDateTime } from '../../../lib/format-date';
import { DashboardCard } from './dashboard-card';

type Versions = QualityDashboard['versionsAwaitingReview'];

/** Recipe versions sent for review, each opening in the builder where it is reviewed. */
export function ReviewVersionsCard({ versions }: { versions: Versions }) {
  return (
    <DashboardCard title="Recipe versions awaiting review">
      {versions.length === 0 ? (
        <p className="text-graphite-700">No version is waiting for review.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {versions.map((v) => (
            <li key={v.id}>
              <TextLink to={`/recipes/${v.recipeId}/versions/${v.id}`}>
                {v.recipeCode} version {v.number}
              </TextLink>
              {v.submittedAt ? <span className="block text-sm text-graphite-700 tabular">Sent {formatDateTime(v.submittedAt)}</span> : null}
            </li>
          ))}
        </ul>
      )}
    </DashboardCard>
  );
}
