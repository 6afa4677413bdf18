import { DISPOSITION_LABELS, type DeviationDetail } from '@tracewright/shared';

import { useToast } from '../../../components/ui/use-toast';
import type { ApiError } from '../../../lib/api-error';
import { useSession } from '../../../lib/session';
import { useDispositionDeviation } from '../api/disposition-deviation';
import { dispositionBody, type DispositionFormOutput } from '../utils/disposition-form-schema';
import { SIGN_MEANINGS } from '../utils/signature-meanings';
import { SignatureDialog } from '../../../components/signatures/signature-dialog';

type DispositionSignDialogProps = {
  deviation: DeviationDetail;
  values: DispositionFormOutput;
  onSigned: () => void;
  onClose: () => void;
  onInvalid: (error: ApiError) => boolean;
};

/** Signs the decision the form holds: the summary of what is signed, then the password. */
export function DispositionSignDialog({ deviation, values, onSigned, onClose, onInvalid }: DispositionSignDialogProps) {
  const { user } = useSession();
  const toast = useToast();
  const disposition = useDispositionDeviation();
  const pieces = deviation.pieces.filter((p) => values.pieceIds.includes(String(p.id))).map((p) => p.code);

  return (
    <SignatureDialog
      title={`Sign the disposition of deviation #${deviation.id}`}
      meaning={SIGN_MEANINGS.disposition(values.disposition)}
      signer={user}
      contentHash={deviation.contentHash}
      signLabel="Sign disposition"
      onSign={(password) => disposition.mutateAsync({ id: deviation.id, input: dispositionBody(values, password, deviation.contentHash) })}
      onSigned={() => {
        toast.show(`Deviation #${deviation.id}: ${DISPOSITION_LABELS[values.disposition]} signed.`);
        onSigned();
      }}
      onClose={onClose}
      onInvalid={onInvalid}
    >
      <p>
        <span className="font-bold">{DISPOSITION_LABELS[values.disposition]}</span> for{' '}
        {pieces.length > 0 ? `pieces ${pieces.join(', ')}` : 'every piece the deviation names'}.
      </p>
    </SignatureDialog>
  );
}
