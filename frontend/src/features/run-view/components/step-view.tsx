import { useState } from 'react';

import type { RecipeStep } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { useBench } from '../hooks/bench-context';
import { benchFigures } from '../utils/bench-figures';
import { recordOf } from '../utils/bench-run';
import { stepTodo } from '../utils/step-todo';
import { writeDrafts } from '../utils/write-drafts';
import { ArtworkPreview } from './artwork-preview';
import { benchButton } from './bench-button-styles';
import { FiguresPanel } from './figures-panel';
import { InstructionsView } from './instructions-view';
import { PartsList } from './parts-list';
import { ReasonDialog } from './reason-dialog';
import { SafetyCard } from './safety-card';
import { StepDeviations } from './step-deviations';
import { StepHeading } from './step-heading';
import { StepTools } from './step-tools';

/**
 * One step filling the screen: what to set, how, the cautions, and the step's own actions.
 * `slidesIn` when the operator moved to it; the page's first step appears at once (an entrance
 * there only delays the first useful paint: bench: paint).
 */
export function StepView({ step, number, slidesIn = false }: { step: RecipeStep; number: number; slidesIn?: boolean }) {
  const { run, record: keep, isWorkable } = useBench();
  const [isClosing, setIsClosing] = useState(false);
  const record = recordOf(run, step.id);
  const cautions = run.safetyNotes[step.id] ?? [];
  const { figures, facts } = benchFigures(step, run);
  const todo = record.state === 'in-progress' ? stepTodo(step, record, run) : [];
  const isOpen = record.state === 'pending' || record.state === 'in-progress';

  return (
    <article
      aria-labelledby="step-title"
      className={`flex flex-col gap-5 ${slidesIn ? 'motion-safe:transition motion-safe:duration-300 motion-safe:starting:translate-x-8 motion-safe:starting:opacity-0' : ''}`}
    >
      <StepHeading step={step} number={number} total={run.content.steps.length} record={record} />
      {cautions.length > 0 ? <SafetyCard stepId={step.id} notes={cautions} record={record} /> : null}
      <div className="grid gap-6 landscape:lg:grid-cols-2">
        <div className="flex flex-col gap-5">
          <FiguresPanel figures={figures} facts={facts} />
          <InstructionsView text={step.instructions} />
          {step.kind === 'print-pass' && step.params.artworkFileId !== null ? <ArtworkPreview fileId={step.params.artworkFileId} title={step.title} /> : null}
          {step.kind === 'attach-parts' ? <PartsList parts={step.params.parts} /> : null}
        </div>
        <div className="flex flex-col gap-5">
          <StepTools step={step} record={record} />
          {todo.length > 0 ? (
            <section aria-labelledby="todo-title" className="rounded-xl border-2 border-graphite-500 bg-white p-4">
              <h2 id="todo-title" className="text-[1.5rem] font-bold">
                Still to do
              </h2>
              <ul className="mt-2 flex flex-col gap-1">
                {todo.map((t) => (
                  <li key={t} className="flex items-center gap-2">
                    <Icon name="paused" className="size-5" />
                    {t}
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
          <StepDeviations deviations={run.deviations.filter((d) => d.stepId === step.id)} />
          {isOpen && isWorkable ? (
            <button type="button" className={benchButton('quiet', 'self-start')} onClick={() => setIsClosing(true)}>
              Close step as not done
            </button>
          ) : null}
        </div>
      </div>
      {isClosing ? (
        <ReasonDialog
          title="Close this step as not done?"
          label="Why is it not done?"
          submitLabel="Close as not done"
          onClose={() => setIsClosing(false)}
          onSubmit={(reason) => {
            setIsClosing(false);
            void keep(writeDrafts.stepNotDone(run.id, step.id, reason));
          }}
        >
          <p>This raises a deviation for quality to review.</p>
        </ReasonDialog>
      ) : null}
    </article>
  );
}
