import type { RecipeStep, StepRecordView } from '@tracewright/shared';

import { useBench } from '../hooks/bench-context';
import { inksPrintedBy, readingTcr } from '../utils/step-inks';
import { CureLogPanel } from './cure-log-panel';
import { LotConfirmPanel } from './lot-confirm-panel';
import { NozzleCheckPanel } from './nozzle-check-panel';
import { ReadingSpecCard } from './reading-spec-card';
import { StepTimers } from './step-timers';

/** What the operator does in the step: timers, lot and nozzle check, oven log, readings — all in view, none in a menu. */
export function StepTools({ step, record }: { step: RecipeStep; record: StepRecordView }) {
  const { run } = useBench();
  const steps = run.content.steps;
  const canRecord = record.state === 'in-progress';
  const tcrPerK = readingTcr(steps, step.id, run.inks);
  const ink = step.kind === 'print-pass' ? run.inks.find((i) => i.id === step.params.inkId) : undefined;
  return (
    <div className="flex flex-col gap-5">
      <StepTimers step={step} record={record} />
      {step.kind === 'print-pass' ? (
        <>
          <LotConfirmPanel stepId={step.id} inkId={step.params.inkId} inkName={ink?.name ?? `ink #${step.params.inkId}`} record={record} canRecord={canRecord} />
          <NozzleCheckPanel stepId={step.id} isRequired={step.params.nozzleCheckRequired} record={record} canRecord={canRecord} />
        </>
      ) : null}
      {step.kind === 'cure' ? <CureLogPanel stepId={step.id} inks={inksPrintedBy(steps, step.id, run.inks)} canRecord={canRecord} /> : null}
      {step.readingSpecs.length > 0 ? (
        <section aria-labelledby={`readings-${step.id}`} className="flex flex-col gap-3">
          <h2 id={`readings-${step.id}`} className="text-[1.5rem] font-bold">
            Readings
          </h2>
          {!canRecord && record.state === 'pending' ? <p className="text-graphite-700">Start the step to record readings.</p> : null}
          {step.readingSpecs.map((spec) => (
            <ReadingSpecCard key={spec.id} stepId={step.id} spec={spec} tcrPerK={tcrPerK} canRecord={canRecord} />
          ))}
        </section>
      ) : null}
    </div>
  );
}
