import { useSuspenseQuery } from '@tanstack/react-query';

import { PageHeader } from '../../../components/ui/page-header';
import { TextLink } from '../../../components/ui/text-link';
import { useSession } from '../../../lib/session';
import { qualityDashboardQueryOptions } from '../api/get-quality-dashboard';
import { LowCapabilityCard } from '../components/low-capability-card';
import { OpenDeviationsCard } from '../components/open-deviations-card';
import { ReviewVersionsCard } from '../components/review-versions-card';
import { SignOffRunsCard } from '../components/sign-off-runs-card';
import { canWriteQuality } from '../utils/quality-roles';

export function QualityDashboardPage() {
  const { data } = useSuspenseQuery(qualityDashboardQueryOptions());
  const { user } = useSession();
  return (
    <>
      <p className="mb-2">
        <TextLink to="/deviations">Deviations</TextLink>
      </p>
      <PageHeader title="Quality overview" description="What waits for a quality decision today, and where a process is drifting." />
      <div className="grid gap-6 lg:grid-cols-2">
        <OpenDeviationsCard dashboard={data} />
        <LowCapabilityCard specs={data.lowCapability} />
        <SignOffRunsCard runs={data.runsAwaitingSignOff} canSign={canWriteQuality(user.role)} />
        <ReviewVersionsCard versions={data.versionsAwaitingReview} />
      </div>
    </>
  );
}
