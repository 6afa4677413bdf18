import { useState } from 'react';

import type { User } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { useToast } from '../../../components/ui/use-toast';
import { useResendInvitation } from '../api/resend-invitation';
import { useUpdateUser } from '../api/update-user';
import { DeactivateConfirm } from './deactivate-confirm';

export function PersonActions({ user }: { user: User }) {
  const [isConfirming, setIsConfirming] = useState(false);
  const update = useUpdateUser();
  const resend = useResendInvitation();
  const toast = useToast();

  const setStatus = (status: 'active' | 'deactivated') =>
    update.mutate(
      { id: user.id, input: { status } },
      {
        onSuccess: (saved) => {
          setIsConfirming(false);
          toast.show(status === 'active' ? `${saved.name} can sign in again.` : `${saved.name} is deactivated.`);
        },
        onError: (error) => toast.show(`Status not changed: ${error.message}`, 'blocked'),
      },
    );

  if (isConfirming) {
    return (
      <DeactivateConfirm name={user.name} isPending={update.isPending} onConfirm={() => setStatus('deactivated')} onCancel={() => setIsConfirming(false)} />
    );
  }

  return (
    <div className="flex flex-wrap gap-2">
      {user.status === 'invited' ? (
        <Button
          variant="secondary"
          isPending={resend.isPending}
          pendingLabel="Sending…"
          aria-label={`Resend invitation to ${user.name}`}
          onClick={() =>
            resend.mutate(user.id, {
              onSuccess: () => toast.show(`Invitation sent again to ${user.email}.`),
              onError: (error) => toast.show(`Invitation not sent: ${error.message}`, 'blocked'),
            })
          }
        >
          Resend invitation
        </Button>
      ) : null}
      {user.status === 'deactivated' ? (
        <Button variant="secondary" isPending={update.isPending} pendingLabel="Saving…" aria-label={`Reactivate ${user.name}`} onClick={() => setStatus('active')}>
          Reactivate
        </Button>
      ) : (
        <Button variant="secondary" aria-label={`Deactivate ${user.name}`} onClick={() => setIsConfirming(true)}>
          Deactivate
        </Button>
      )}
    </div>
  );
}
