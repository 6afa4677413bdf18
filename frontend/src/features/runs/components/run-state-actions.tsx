import { useState } from 'react';

import type { RunDetail } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { useSession } from '../../../lib/session';
import { ACTION_WORDS } from '../utils/run-action-words';
import { availableRunActions, type RunAction } from '../utils/run-actions';
import { StateChangeForm } from './state-change-form';

/** Hold, resume or cancel, as the run's state and the person's role allow; each asks for a reason. */
export function RunStateActions({ run }: { run: RunDetail }) {
  const { user } = useSession();
  const [open, setOpen] = useState<RunAction | null>(null);
  const actions = availableRunActions(run.state, user.role);
  if (actions.length === 0) return null;
  return (
    <section aria-labelledby="state-actions-title" className="flex flex-col gap-3 print:hidden">
      <h2 id="state-actions-title" className="text-lg font-bold">
        Change the run’s state
      </h2>
      <div className="flex flex-wrap gap-2">
        {actions.map((action) => (
          <Button key={action} variant={action === 'cancel' ? 'danger' : 'secondary'} aria-expanded={open === action} onClick={() => setOpen(open === action ? null : action)}>
            {ACTION_WORDS[action].button}
          </Button>
        ))}
      </div>
      {open ? <StateChangeForm key={open} runId={run.id} runCode={run.code} action={open} onClose={() => setOpen(null)} /> : null}
    </section>
  );
}
