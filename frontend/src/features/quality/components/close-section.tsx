import { useState } from 'react';

import type { DeviationDetail } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { useToast } from '../../../components/ui/use-toast';
import { useSession } from '../../../lib/session';
import { useCloseDeviation } from '../api/close-deviation';
import { SIGN_MEANINGS } from '../utils/signature-meanings';
import { DetailSection } from './detail-section';
import { SignatureDialog } from '../../../components/signatures/signature-dialog';
import { TextAreaField } from '../../../components/ui/text-area-field';

/** Closing is the last signature: the corrective action was checked and works. */
export function CloseSection({ deviation }: { deviation: DeviationDetail }) {
  const { user } = useSession();
  const toast = useToast();
  const close = useCloseDeviation();
  const [note, setNote] = useState('');
  const [isSigning, setIsSigning] = useState(false);
  const actions = deviation.dispositions.flatMap((d) => (d.correctiveAction ? [d.correctiveAction] : []));

  return (
    <DetailSection title="Verify and close">
      {actions.length > 0 ? (
        <ul className="list-disc pl-6">
          {actions.map((a) => (
            <li key={`${a.note}-${a.dueOn}`}>
              {a.note} — {a.owner?.name ?? 'no owner'}, due {a.dueOn}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-graphite-700">No corrective action was set; closing confirms the dispositions are carried out.</p>
      )}
      <div className="flex max-w-2xl flex-col gap-4">
        <TextAreaField label="Verification" rows={3} help="What you checked, and how you know the action works." value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} />
        <div>
          <Button onClick={() => setIsSigning(true)}>Sign and close…</Button>
        </div>
      </div>
      {isSigning ? (
        <SignatureDialog
          title={`Close deviation #${deviation.id}`}
          meaning={SIGN_MEANINGS.close}
          signer={user}
          contentHash={deviation.contentHash}
          signLabel="Sign and close"
          onSign={(password) => close.mutateAsync({ id: deviation.id, input: { password, contentHash: deviation.contentHash, verificationNote: note.trim() } })}
          onSigned={() => {
            setIsSigning(false);
            toast.show(`Deviation #${deviation.id} closed.`);
          }}
          onClose={() => setIsSigning(false)}
        />
      ) : null}
    </DetailSection>
  );
}
