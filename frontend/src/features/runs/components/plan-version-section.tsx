import { useQuery } from '@tanstack/react-query';

import { FormError } from '../../../components/ui/form-error';
import { LoadingState } from '../../../components/ui/loading-state';
import { recipeVersionQueryOptions } from '../api/get-recipe-version';
import type { PlanClock, PlanSources } from '../utils/plan-issues';
import { PlanRunForm } from './plan-run-form';

type PlanVersionSectionProps = { versionId: number; sources: PlanSources; clock: PlanClock };

/** Loads the picked version; a new pick starts a fresh form, as its lots and machines differ. */
export function PlanVersionSection({ versionId, sources, clock }: PlanVersionSectionProps) {
  const version = useQuery(recipeVersionQueryOptions(versionId));
  if (version.isPending) return <LoadingState label="Loading the version…" />;
  if (version.isError) return <FormError message={`This version could not be loaded: ${version.error.message}`} />;
  if (version.data.state !== 'released') {
    return <FormError message={`Version ${version.data.number} of ${version.data.recipe.code} is not released, so it cannot be run. Pick another.`} />;
  }
  return <PlanRunForm key={versionId} version={version.data} sources={sources} clock={clock} />;
}
