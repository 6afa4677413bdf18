import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';

import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { TextLink } from '../../../components/ui/text-link';
import { useSession } from '../../../lib/session';
import { deviationQueryOptions } from '../api/get-deviation';
import { AssignForm } from '../components/assign-form';
import { CloseSection } from '../components/close-section';
import { ClosureRecord } from '../components/closure-record';
import { CommentForm } from '../components/comment-form';
import { DeviationContext } from '../components/deviation-context';
import { DeviationFacts } from '../components/deviation-facts';
import { DeviationHistory } from '../components/deviation-history';
import { DeviationPhotos } from '../components/deviation-photos';
import { DeviationReadings } from '../components/deviation-readings';
import { DispositionForm } from '../components/disposition-form';
import { DispositionRecords } from '../components/disposition-records';
import { ExpectedActual } from '../components/expected-actual';
import { idParam } from '../utils/id-param';
import { canWriteQuality } from '../utils/quality-roles';

export function DeviationPage() {
  const id = idParam(useParams().deviationId);
  const { data: deviation } = useSuspenseQuery(deviationQueryOptions(id));
  const { user } = useSession();
  // A closed deviation is final: no forms at all, for anyone.
  const canWrite = canWriteQuality(user.role) && deviation.state !== 'closed';
  const canDisposition = canWrite && (deviation.state === 'open' || deviation.state === 'in-review');

  return (
    <>
      <p className="mb-2">
        <TextLink to="/deviations">All deviations</TextLink>
      </p>
      <PageHeader title={`Deviation #${deviation.id}: ${deviation.title}`} />
      <DeviationFacts deviation={deviation} />
      {deviation.state === 'closed' ? (
        <div className="mb-6">
          <Notice tone="pass" title="Closed: this record is read-only" role="note">
            <p>The corrective action was verified and the deviation signed closed. Nothing here can be changed any more.</p>
          </Notice>
        </div>
      ) : null}
      <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="flex min-w-0 flex-col gap-8">
          <ExpectedActual deviation={deviation} />
          <DeviationReadings readings={deviation.readings} />
          <DeviationPhotos fileIds={deviation.photoFileIds} deviationId={deviation.id} />
          <DeviationContext deviation={deviation} />
          <DispositionRecords deviation={deviation} />
          {canDisposition ? <DispositionForm deviation={deviation} /> : null}
          {canWrite && deviation.state === 'dispositioned' ? <CloseSection deviation={deviation} /> : null}
          {deviation.closure ? <ClosureRecord closure={deviation.closure} /> : null}
        </div>
        <div className="flex flex-col gap-8">
          {canWrite ? <AssignForm deviation={deviation} /> : null}
          {canWrite ? <CommentForm deviationId={deviation.id} /> : null}
          <DeviationHistory events={deviation.events} />
        </div>
      </div>
    </>
  );
}
