import { useEffect, useId, useRef } from 'react';

import { Button } from '../../../components/ui/button';

type DeactivateConfirmProps = { name: string; isPending: boolean; onConfirm: () => void; onCancel: () => void };

/** Asks in place, beside the row it concerns, and takes the focus so the question is heard. */
export function DeactivateConfirm({ name, isPending, onConfirm, onCancel }: DeactivateConfirmProps) {
  const questionId = useId();
  const confirmRef = useRef<HTMLButtonElement>(null);
  useEffect(() => confirmRef.current?.focus(), []);

  return (
    <div role="group" aria-labelledby={questionId} className="flex flex-col gap-2 rounded-md border-2 border-oxide-700 bg-oxide-50 p-2">
      <p id={questionId} className="text-sm font-bold text-oxide-800">
        Deactivate {name}? They can no longer sign in or use a PIN. Their records stay.
      </p>
      <div className="flex flex-wrap gap-2">
        <Button ref={confirmRef} variant="danger" isPending={isPending} pendingLabel="Deactivating…" onClick={onConfirm}>
          Yes, deactivate
        </Button>
        <Button variant="secondary" onClick={onCancel} disabled={isPending}>
          Keep active
        </Button>
      </div>
    </div>
  );
}
