import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../lib/session';
import { trendQueryOptions } from '../api/get-trend';
import { trendSpecsQueryOptions } from '../api/get-trend-specs';
import { SpecPicker } from '../components/spec-picker';
import { TrendPrintStyles } from '../components/trend-print-styles';
import { TrendView } from '../components/trend-view';
import { canWriteQuality } from '../utils/quality-roles';
import { listedChoice, trendChoiceOf, type TrendChoice } from '../utils/trend-search';

function ChosenTrend({ choice }: { choice: NonNullable<TrendChoice> }) {
  const { data } = useSuspenseQuery(trendQueryOptions(choice.recipeId, choice.specId));
  const { user } = useSession();
  return <TrendView trend={data} canEdit={canWriteQuality(user.role)} />;
}

export function TrendsPage() {
  const [search] = useSearchParams();
  const asked = trendChoiceOf(search);
  const { data: specs } = useSuspenseQuery(trendSpecsQueryOptions());
  const choice = listedChoice(asked, specs);

  return (
    <div data-print-root>
      <TrendPrintStyles />
      <PageHeader
        title="Trends"
        description="A reading spec across runs: individuals and moving-range charts, rule breaks, capability and the spread against the limits."
        actions={
          choice ? (
            <Button variant="secondary" onClick={() => window.print()} className="print:hidden">
              <Icon name="printer" />
              Print
            </Button>
          ) : null
        }
      />
      <SpecPicker specs={specs} choice={choice} />
      {choice ? (
        <ChosenTrend choice={choice} />
      ) : asked ? (
        <Notice tone="warning" title="That reading spec has no trend here.">
          <p>The address names a spec with no readings yet, or one that is gone (renamed in a later version, or a mistyped address). Choose one from the list.</p>
        </Notice>
      ) : (
        <Notice title={specs.length ? 'Choose a reading spec to see its trend.' : 'No reading has been recorded against a spec yet.'} />
      )}
    </div>
  );
}
