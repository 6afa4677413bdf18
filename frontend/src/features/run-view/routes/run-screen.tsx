import { useSuspenseQuery } from '@tanstack/react-query';
import { useCallback, useEffect, useMemo, useState } from 'react';

import { useToast } from '../../../components/ui/use-toast';
import { useSession } from '../../../lib/session';
import { runSnapshotQueryOptions } from '../api/get-run-detail';
import { ActionBar } from '../components/action-bar';
import { OutboxAlerts } from '../components/outbox-alerts';
import { PendingWritesDialog } from '../components/pending-writes-dialog';
import { ReportProblemDialog } from '../components/report-problem-dialog';
import { RunBanners } from '../components/run-banners';
import { RunHeader } from '../components/run-header';
import { StepView } from '../components/step-view';
import { StepsDrawer } from '../components/steps-drawer';
import { TimerLayer } from '../components/timer-layer';
import { TimerTray } from '../components/timer-tray';
import { BenchContext, type Bench } from '../hooks/bench-context';
import { useOutbox, useOutboxState } from '../hooks/outbox-context';
import { useStepChoice } from '../hooks/use-step-choice';
import type { WriteDraft } from '../outbox/outbox-types';
import { applyWrites } from '../utils/apply-writes';

type Open = 'steps' | 'outbox' | 'report' | null;

/** The run on the tablet: the server's last answer with the outbox applied, one step at a time. */
export function RunScreen({ runId }: { runId: number }) {
  const { data: snapshot } = useSuspenseQuery(runSnapshotQueryOptions(runId));
  const outbox = useOutbox();
  const { items } = useOutboxState();
  const { user } = useSession();
  const toast = useToast();
  const [open, setOpen] = useState<Open>(null);
  const run = useMemo(() => applyWrites(snapshot.run, items, snapshot.clockOffsetMs), [snapshot, items]);
  const { step, index, goToStep } = useStepChoice(run);
  const steps = run.content.steps;
  // Once the shown step is not the first one, every step change slides the new card in.
  const [firstStepId] = useState(() => step?.id ?? null);
  const [hasMoved, setHasMoved] = useState(false);
  if (!hasMoved && step && step.id !== firstStepId) setHasMoved(true);

  useEffect(() => {
    // A fresh answer includes every write sent before it was asked for: those can be forgotten.
    if (snapshot.isFresh) void outbox.purgeSent(snapshot.requestedAt);
  }, [snapshot, outbox]);

  const record = useCallback(
    async (draft: WriteDraft) => {
      const number = steps.findIndex((s) => s.id === draft.stepId) + 1;
      const stepLabel = number > 0 ? `step ${number}` : undefined;
      try {
        return await outbox.enqueue({ ...draft, meta: { ...draft.meta, stepLabel } });
      } catch (error) {
        toast.show(`Not saved: ${error instanceof Error ? error.message : 'the tablet could not keep it'}. Try again.`, 'blocked');
        return null;
      }
    },
    [outbox, steps, toast],
  );

  const bench = useMemo<Bench>(
    () => ({ run, clockOffsetMs: snapshot.clockOffsetMs, isFresh: snapshot.isFresh, person: { id: user.id, name: user.name }, isWorkable: run.state === 'planned' || run.state === 'in-progress', goToStep, record }),
    [run, snapshot, user, goToStep, record],
  );

  return (
    <BenchContext.Provider value={bench}>
      <TimerLayer timers={run.timers} clockOffsetMs={snapshot.clockOffsetMs}>
        <div className="flex min-h-dvh flex-col bg-paper text-[1.25rem] text-graphite-900">
          <RunHeader stepNumber={index + 1} onOpenSteps={() => setOpen('steps')} onOpenOutbox={() => setOpen('outbox')} />
          <RunBanners savedAt={snapshot.requestedAt} />
          <OutboxAlerts />
          <TimerTray steps={steps} currentStepId={step?.id ?? null} />
          {/* Clip sideways: the step card slides in from the side and must not flash a scrollbar. */}
          <main className="flex-1 overflow-x-clip px-4 py-5">{step ? <StepView key={step.id} step={step} number={index + 1} slidesIn={hasMoved} /> : <p>This recipe version has no steps.</p>}</main>
          {step ? <ActionBar step={step} previousId={steps[index - 1]?.id ?? null} nextId={steps[index + 1]?.id ?? null} onGo={goToStep} onReport={() => setOpen('report')} /> : null}
        </div>
        {open === 'steps' && step ? <StepsDrawer currentStepId={step.id} onClose={() => setOpen(null)} /> : null}
        {open === 'outbox' ? <PendingWritesDialog onClose={() => setOpen(null)} /> : null}
        {open === 'report' ? <ReportProblemDialog step={step} onClose={() => setOpen(null)} /> : null}
      </TimerLayer>
    </BenchContext.Provider>
  );
}
