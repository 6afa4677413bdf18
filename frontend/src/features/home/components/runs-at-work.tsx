import { useQuery } from '@tanstack/react-query';

import { TextLink } from '../../../components/ui/text-link';
import { runsInStateQueryOptions } from '../api/get-runs-in-state';
import { CountLink } from './count-link';
import { HomeSection } from './home-section';

/**
 * The runs on the floor: those in progress by name, with how far each has got, and how many are
 * on hold or planned. Operators are told how a run reaches their tablet.
 */
export function RunsAtWork({ forOperator }: { forOperator: boolean }) {
  const inProgress = useQuery(runsInStateQueryOptions('in-progress', 5));
  const onHold = useQuery(runsInStateQueryOptions('on-hold', 1));
  const planned = useQuery(runsInStateQueryOptions('planned', 1));
  const failed = inProgress.isError || onHold.isError || planned.isError;

  return (
    <HomeSection title="Runs on the floor">
      {forOperator ? <p>At the bench, scan the QR code on a run’s traveller to open it on the tablet.</p> : null}
      {failed ? (
        <p role="status">The runs could not be loaded just now. Open Runs to see them.</p>
      ) : !inProgress.data || !onHold.data || !planned.data ? (
        <p role="status" className="text-graphite-600">
          Loading runs…
        </p>
      ) : (
        <>
          {inProgress.data.runs.length === 0 ? (
            <p>No run is in progress.</p>
          ) : (
            <ul className="space-y-2" aria-label="Runs in progress">
              {inProgress.data.runs.map((run) => (
                <li key={run.id} className="flex flex-wrap items-baseline gap-x-3">
                  <TextLink to={`/runs/${run.id}`} className="font-mono">
                    {run.code}
                  </TextLink>
                  <span>
                    {run.recipeCode} · {run.recipeName}
                  </span>
                  <span className="text-graphite-700">
                    {run.doneSteps} of {run.totalSteps} steps done
                    {run.openDeviations > 0 ? ` · ${run.openDeviations} open deviation${run.openDeviations === 1 ? '' : 's'}` : ''}
                  </span>
                </li>
              ))}
            </ul>
          )}
          <p className="flex flex-wrap gap-x-6 gap-y-1">
            <CountLink to="/runs?state=in-progress" count={inProgress.data.total} one="run in progress" many="runs in progress" />
            <CountLink to="/runs?state=on-hold" count={onHold.data.total} one="run on hold" many="runs on hold" />
            <CountLink to="/runs?state=planned" count={planned.data.total} one="run planned" many="runs planned" />
          </p>
        </>
      )}
    </HomeSection>
  );
}
