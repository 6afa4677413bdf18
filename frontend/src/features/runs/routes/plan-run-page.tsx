import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useSearchParams } from 'react-router';

import { isoDateInZone } from '@tracewright/shared';

import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { labSettingsQueryOptions } from '../api/get-lab-settings';
import { releasedRecipesQueryOptions } from '../api/get-released-recipes';
import { PlanVersionSection } from '../components/plan-version-section';
import { VersionPicker } from '../components/version-picker';
import { usePlanSources } from '../hooks/use-plan-sources';
import type { PlanClock } from '../utils/plan-issues';
import { versionParam } from '../utils/version-param';

export function PlanRunPage() {
  const { data: recipes } = useSuspenseQuery(releasedRecipesQueryOptions());
  const { data: settings } = useSuspenseQuery(labSettingsQueryOptions());
  const sources = usePlanSources();
  const [search, setSearch] = useSearchParams();
  const versionId = versionParam(search);
  // Expiry, pot life and calibration are judged against the lab's calendar as the form opens.
  const [clock] = useState<PlanClock>(() => {
    const now = new Date();
    return { now, today: isoDateInZone(now, settings.timeZone) };
  });

  return (
    <>
      <PageHeader
        title="Plan a run"
        description="Choose what to make and how many, then the lots and machines the bench will use. The traveller is ready to print once the run is planned."
      />
      <div className="flex max-w-2xl flex-col gap-6">
        {recipes.length === 0 ? (
          <Notice title="No recipe has a released version yet.">
            <p>A version can be run once quality has released it. Ask quality, or open Recipes to see where each one stands.</p>
          </Notice>
        ) : (
          <VersionPicker recipes={recipes} versionId={versionId} onPick={(id) => setSearch(id === null ? {} : { version: String(id) }, { replace: true })} />
        )}
        {versionId === null ? null : <PlanVersionSection versionId={versionId} sources={sources} clock={clock} />}
      </div>
    </>
  );
}
