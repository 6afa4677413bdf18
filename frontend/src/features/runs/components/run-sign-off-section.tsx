import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';

import { stateInWords, type RunDetail } from '@tracewright/shared';

import { SignatureDialog } from '../../../components/signatures/signature-dialog';
import { SignatureManifest } from '../../../components/signatures/signature-manifest';
import { RUN_SIGN_OFF_MEANING } from '../../../components/signatures/signature-meanings';
import { Button } from '../../../components/ui/button';
import { TextLink } from '../../../components/ui/text-link';
import { useToast } from '../../../components/ui/use-toast';
import { useSession } from '../../../lib/session';
import { runSignOffQueryOptions } from '../api/get-run-sign-off';
import { useSignOffRun } from '../api/sign-off-run';
import { canSignOffRuns } from '../utils/run-actions';

/**
 * The run's quality sign-off: the signature as it stands on the record (printed name, date and
 * time, meaning), or why the record cannot be signed yet, or, for quality, the way to sign it.
 */
export function RunSignOffSection({ run }: { run: RunDetail }) {
  const { user } = useSession();
  const toast = useToast();
  const { data: view } = useSuspenseQuery(runSignOffQueryOptions(run.id));
  const signOff = useSignOffRun();
  const [isSigning, setIsSigning] = useState(false);
  const canSign = view.canSignOff && canSignOffRuns(user.role);

  return (
    <section aria-labelledby="sign-off-title" className="flex flex-col gap-3">
      <h2 id="sign-off-title" className="text-2xl font-bold">
        Quality sign-off
      </h2>
      {view.signature ? (
        <>
          <p>This run record was approved; the run is closed and takes no more records.</p>
          <SignatureManifest signature={view.signature} />
        </>
      ) : canSign ? (
        <div className="flex flex-wrap items-center gap-3 print:hidden">
          <p>Every step is recorded and every deviation has a disposition: the record can be signed off.</p>
          <Button onClick={() => setIsSigning(true)}>Sign off run…</Button>
        </div>
      ) : (
        <>
          <p>{view.canSignOff ? 'Not signed off yet. Quality signs the record off.' : `Not signed off yet. ${view.refusal ?? ''}`}</p>
          {view.undecided.length > 0 ? (
            <ul aria-label="Deviations without a disposition" className="list-disc pl-6">
              {view.undecided.map((d) => (
                <li key={d.id}>
                  <TextLink to={`/deviations/${d.id}`}>{`#${d.id} ${d.title}`}</TextLink> ({stateInWords(d.state)})
                </li>
              ))}
            </ul>
          ) : null}
        </>
      )}
      {isSigning ? (
        <SignatureDialog
          title={`Sign off run ${run.code}`}
          meaning={RUN_SIGN_OFF_MEANING}
          signer={user}
          contentHash={view.contentHash}
          signLabel="Sign off run"
          onSign={(password) => signOff.mutateAsync({ runId: run.id, input: { password, contentHash: view.contentHash } })}
          onSigned={() => {
            toast.show(`Run ${run.code} signed off.`);
            setIsSigning(false);
          }}
          onClose={() => setIsSigning(false)}
        >
          <p>
            Run <span className="font-bold">{run.code}</span> of {run.recipeCode}, version {run.versionNumber}: {run.doneSteps} of {run.totalSteps} steps done,{' '}
            {run.deviations.length === 1 ? '1 deviation' : `${run.deviations.length} deviations`}, each with a disposition.
          </p>
        </SignatureDialog>
      ) : null}
    </section>
  );
}
