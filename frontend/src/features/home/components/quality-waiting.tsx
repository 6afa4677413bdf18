import { useQuery } from '@tanstack/react-query';

import { TextLink } from '../../../components/ui/text-link';
import { qualityWaitingQueryOptions } from '../api/get-quality-waiting';
import { CountLink } from './count-link';
import { HomeSection } from './home-section';

/** Deviation states that still wait for a decision or a closure (the quality overview's "open"). */
const UNDECIDED = '/deviations?state=open%2Cin-review%2Cdispositioned';

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
              <CountLink to={UNDECIDED} count={data.deviationsNotClosed} one="deviation not yet closed" many="deviations not yet closed" />
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
