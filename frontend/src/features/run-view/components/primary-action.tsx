import { useState } from 'react';

import type { RecipeStep } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { useBench } from '../hooks/bench-context';
import { recordOf } from '../utils/bench-run';
import { nextAction } from '../utils/next-action';
import { stepTodo } from '../utils/step-todo';
import { writeDrafts } from '../utils/write-drafts';
import { BenchDialog } from './bench-dialog';
import { benchButton } from './bench-button-styles';
import { ReasonDialog } from './reason-dialog';

const GROW = 'flex-1 basis-64';

/** The next thing to do, as the one large copper button; when it can't be pressed yet, the reason is beside it. */
export function PrimaryAction({ step }: { step: RecipeStep }) {
  const { run, record: keep, goToStep } = useBench();
  const [dialog, setDialog] = useState<'confirm-done' | 'resume' | null>(null);
  const record = recordOf(run, step.id);
  const action = nextAction(run, record, (run.safetyNotes[step.id] ?? []).length > 0);
  const todo = stepTodo(step, record, run);
  const complete = () => {
    setDialog(null);
    void keep(writeDrafts.completeStep(run.id, step.id));
  };

  switch (action.kind) {
    case 'start':
      return (
        <div className="flex flex-1 basis-64 flex-col gap-1">
          <button type="button" className={benchButton('primary', 'w-full', 'hero')} disabled={action.blockedBy !== null} aria-describedby={action.blockedBy ? 'start-blocked' : undefined} onClick={() => void keep(writeDrafts.startStep(run.id, step.id))}>
            Start step
          </button>
          {action.blockedBy ? (
            <p id="start-blocked" className="flex items-center gap-2 text-base font-bold text-amber-800">
              <Icon name="warning" className="size-5" />
              {action.blockedBy}
            </p>
          ) : null}
        </div>
      );
    case 'complete':
      return (
        <>
          <button type="button" className={benchButton('primary', GROW, 'hero')} onClick={() => (todo.length > 0 ? setDialog('confirm-done') : complete())}>
            <Icon name="check" className="size-7" />
            Step done
          </button>
          {dialog === 'confirm-done' ? (
            <BenchDialog title="Some things are not recorded yet" onClose={() => setDialog(null)} tone="warning">
              <ul className="mb-4 list-disc pl-7">
                {todo.map((t) => (
                  <li key={t}>{t}</li>
                ))}
              </ul>
              <div className="flex flex-wrap justify-end gap-2">
                <button type="button" className={benchButton('secondary')} onClick={() => setDialog(null)} data-autofocus>
                  Go back to the step
                </button>
                <button type="button" className={benchButton('primary')} onClick={complete}>
                  Mark done anyway
                </button>
              </div>
            </BenchDialog>
          ) : null}
        </>
      );
    case 'next-step':
      return (
        <button type="button" className={benchButton('primary', GROW, 'hero')} onClick={() => goToStep(action.stepId)}>
          Next: step {action.number}
        </button>
      );
    case 'resume':
      return (
        <>
          <button type="button" className={benchButton('primary', GROW, 'hero')} onClick={() => setDialog('resume')}>
            Resume run
          </button>
          {dialog === 'resume' ? (
            <ReasonDialog title="Resume the run" label="Why can work go on?" submitLabel="Resume run" onClose={() => setDialog(null)} onSubmit={(reason) => {
              setDialog(null);
              void keep(writeDrafts.resumeRun(run.id, reason));
            }} />
          ) : null}
        </>
      );
    case 'finished':
      return <p className="flex flex-1 basis-64 items-center gap-2 text-[1.5rem] font-bold text-verdigris-800"><Icon name="check" className="size-7" />Every step is settled.</p>;
    case 'closed':
      return <p className="flex flex-1 basis-64 items-center text-[1.25rem] font-bold">{action.why}</p>;
  }
}
