import type { QualityDashboard } from '@tracewright/shared';

import { useToast } from '../../../components/ui/use-toast';
import { useSession } from '../../../lib/session';
import { useSignOffRun } from '../api/sign-off-run';
import { SIGN_MEANINGS } from '../utils/signature-meanings';
import { SignatureDialog } from '../../../components/signatures/signature-dialog';

type Run = QualityDashboard['runsAwaitingSignOff'][number];

/** Signs a run's record off; a refusal (a deviation still undecided) is shown in the dialog. */
export function SignOffDialog({ run, onClose }: { run: Run; onClose: () => void }) {
  const { user } = useSession();
  const toast = useToast();
  const signOff = useSignOffRun();
  return (
    <SignatureDialog
      title={`Sign off run ${run.code}`}
      meaning={SIGN_MEANINGS.runSignOff}
      signer={user}
      contentHash={null}
      signLabel="Sign off run"
      onSign={(password) => signOff.mutateAsync({ runId: run.id, input: { password } })}
      onSigned={() => {
        toast.show(`Run ${run.code} signed off.`);
        onClose();
      }}
      onClose={onClose}
    >
      <p>
        Run <span className="font-bold">{run.code}</span> of {run.recipeCode}.{' '}
        {run.openDeviations > 0 ? `It still has ${run.openDeviations} deviation(s) without a disposition; sign-off will be refused until they have one.` : null}
      </p>
    </SignatureDialog>
  );
}
