import { useState } from 'react';
import { Link, useLocation } from 'react-router';

import { FormError } from '../../../components/ui/form-error';
import { signInPath } from '../../../lib/sign-in-path';
import { useOutbox } from '../hooks/outbox-context';
import { withDependents } from '../outbox/outbox-items';
import type { OutboxItem } from '../outbox/outbox-types';
import { writeLabel } from '../utils/write-labels';
import { benchButton } from './bench-button-styles';
import { OutOfLimitsDialog } from './out-of-limits-dialog';

function evaluationMessage(item: OutboxItem): string | null {
  if (item.error?.status !== 422 || (item.kind !== 'record-reading' && item.kind !== 'correct-reading')) return null;
  const evaluation = (item.error.details as { evaluation?: { message?: unknown } } | undefined)?.evaluation;
  return typeof evaluation?.message === 'string' ? evaluation.message : item.error.message;
}

/**
 * A write the server turned down. Everything after it waits, in order, until the operator
 * decides: send it again (after signing in, say) or drop it. An out-of-limit reading the server
 * caught is asked about as it would be on entry.
 */
export function RefusedWrite({ item, items }: { item: OutboxItem; items: OutboxItem[] }) {
  const outbox = useOutbox();
  const location = useLocation();
  const [isDropping, setIsDropping] = useState(false);
  const [isAsking, setIsAsking] = useState(true);
  const outOfLimits = evaluationMessage(item);
  const dependents = withDependents(items, item.id).length - 1;
  const error = item.error;

  return (
    <section aria-label="A write was refused" className="flex flex-col gap-3 border-b-2 border-oxide-700 bg-oxide-50 px-4 py-3">
      <FormError message={`Not saved: ${writeLabel(item)}. ${error?.message ?? ''}`} />
      {error?.status === 401 ? (
        <p>
          Your session ended. The write stays on this tablet.{' '}
          <Link to={signInPath(location)} className="font-bold text-copper-700 underline">
            Sign in again
          </Link>
          , then press “Send again”.
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {outOfLimits ? (
          <button type="button" className={benchButton('primary')} onClick={() => setIsAsking(true)}>
            Review the reading
          </button>
        ) : (
          <button type="button" className={benchButton('primary')} onClick={() => void outbox.resend(item.id)}>
            Send again
          </button>
        )}
        {isDropping ? (
          <button type="button" className={benchButton('danger')} onClick={() => void outbox.discard(item.id)}>
            Yes, drop it{dependents > 0 ? ` and the ${dependents} write${dependents === 1 ? '' : 's'} that need it` : ''}
          </button>
        ) : (
          <button type="button" className={benchButton('secondary')} onClick={() => setIsDropping(true)}>
            Drop this write
          </button>
        )}
      </div>
      {outOfLimits && isAsking ? (
        <OutOfLimitsDialog
          message={outOfLimits}
          closeLabel="Not now"
          onClose={() => setIsAsking(false)}
          onConfirm={() => {
            setIsAsking(false);
            void outbox.resend(item.id, { confirmOutOfLimits: true });
          }}
        />
      ) : null}
    </section>
  );
}
