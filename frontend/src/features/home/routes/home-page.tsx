import { ROLE_LABELS, may } from '@tracewright/shared';

import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { TextLink } from '../../../components/ui/text-link';
import { useSession } from '../../../lib/session';
import { PlacesList, type Place } from '../components/places-list';
import { QualityWaiting } from '../components/quality-waiting';
import { RunsAtWork } from '../components/runs-at-work';

/**
 * Where a person starts: what waits for them today (live figures, each a link to the list
 * behind it), then every page their role opens. `places` comes from the app's navigation.
 */
export function HomePage({ places }: { places: readonly Place[] }) {
  const { user } = useSession();
  const firstName = user.name.split(' ')[0] ?? user.name;
  const role = ROLE_LABELS[user.role];
  const quality = may(user.role, 'readQuality') ? <QualityWaiting /> : null;
  const runs = <RunsAtWork forOperator={user.role === 'operator'} />;

  return (
    <>
      <PageHeader title={`Welcome, ${firstName}`} description={`Your role: ${role.name}. ${role.summary}`} />
      <div className="max-w-3xl space-y-6">
        {user.hasPin ? null : (
          <Notice title="You have no PIN yet.">
            <p>
              On shared tablets, a PIN saves typing your password. <TextLink to="/my-pin">Set your PIN</TextLink>.
            </p>
          </Notice>
        )}
        {/* Quality staff see their decisions first; everyone else starts from the floor. */}
        {user.role === 'quality' ? (
          <>
            {quality}
            {runs}
          </>
        ) : (
          <>
            {runs}
            {quality}
          </>
        )}
        <PlacesList places={places} />
      </div>
    </>
  );
}
