import { useEffect, useId, useRef } from 'react';

import { Button } from '../../../components/ui/button';

type ArchiveConfirmProps = { question: string; confirmLabel: string; isPending: boolean; onConfirm: () => void; onCancel: () => void };

/** Asks in place and takes the focus, so the question is heard before anything changes. */
export function ArchiveConfirm({ question, confirmLabel, isPending, onConfirm, onCancel }: ArchiveConfirmProps) {
  const questionId = useId();
  const confirmRef = useRef<HTMLButtonElement>(null);
  useEffect(() => confirmRef.current?.focus(), []);

  return (
    <div role="group" aria-labelledby={questionId} className="flex max-w-md flex-col gap-2 rounded-md border-2 border-amber-700 bg-amber-50 p-3">
      <p id={questionId} className="font-bold text-amber-800">
        {question}
      </p>
      <div className="flex flex-wrap gap-2">
        <Button ref={confirmRef} isPending={isPending} pendingLabel="Saving…" onClick={onConfirm}>
          {confirmLabel}
        </Button>
        <Button variant="secondary" onClick={onCancel} disabled={isPending}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
