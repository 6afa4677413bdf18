import { useQuery } from '@tanstack/react-query';

import { DEVIATION_STATES } from '@tracewright/shared';

import { TextLink } from '../../../components/ui/text-link';
import { qualityWaitingQueryOptions } from '../api/get-quality-waiting';
import { CountLink } from './count-link';
import { HomeSection } from './home-section';

/** The queue filtered to every state but closed: what the count counts. */
const NOT_CLOSED = `/deviations?${new URLSearchParams({ state: DEVIATION_STATES.filter((state) => state !== 'closed').join(',') }).toString()}`;

/** What waits for quality: deviations not yet closed, runs to sign off, versions to review. */
export function QualityWaiting() {
  const { data, isError } = useQuery(qualityWaitingQueryOptions());
  return (
    <HomeSection title="Waiting for a decision">
      {isError ? (
        <p role="status">These figures could not be loaded just now.</p>
      ) : !data ? (
        <p role="status" className="text-graphite-600">
          Loading…
        </p>
      ) : (
        <>
          <ul className="space-y-2">
            <li>
              <CountLink to={NOT_CLOSED} count={data.deviationsNotClosed} one="deviation not yet closed" many="deviations not yet closed" />
            </li>
            <li>
              <CountLink to="/quality" count={data.runsAwaitingSignOff} one="run awaiting sign-off" many="runs awaiting sign-off" />
            </li>
            <li>
              <CountLink to="/quality" count={data.versionsAwaitingReview} one="recipe version awaiting review" many="recipe versions awaiting review" />
            </li>
          </ul>
          <p>
            <TextLink to="/quality">Quality overview</TextLink>: the same by severity and age, with weak capability.
          </p>
        </>
      )}
    </HomeSection>
  );
}
