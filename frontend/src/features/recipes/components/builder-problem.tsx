import type { ProcessCheck, RecipeStep } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { Button } from '../../../components/ui/button';
import type { BuilderProblem } from '../hooks/use-builder-actions';
import { CheckLine } from './check-line';

type BuilderProblemProps = { problem: BuilderProblem; steps: readonly RecipeStep[]; onReloadTheirs: () => void; onSelectStep: (id: string) => void };

const numberOf = (steps: readonly RecipeStep[], check: ProcessCheck) => (check.stepId === null ? null : steps.findIndex((s) => s.id === check.stepId) + 1 || null);

/** What stopped the last save or send, read out at once, with the way forward. */
export function BuilderProblemNotice({ problem, steps, onReloadTheirs, onSelectStep }: BuilderProblemProps) {
  return (
    <div role="alert" className="mb-4 flex flex-col gap-3 rounded-md border-2 border-oxide-700 bg-oxide-50 p-4 text-oxide-800">
      <p className="flex items-start gap-2 font-bold">
        <Icon name="blocked" className="mt-0.5 size-5" />
        <span>{problem.message}</span>
      </p>
      {problem.kind === 'conflict' ? (
        <div className="flex flex-wrap items-center gap-3 text-graphite-900">
          <Button variant="secondary" onClick={onReloadTheirs}>
            <Icon name="refresh" />
            Reload their version
          </Button>
          <span className="text-sm">This replaces your unsaved edits with the saved version.</span>
        </div>
      ) : null}
      {problem.kind === 'blocked' ? (
        <ul aria-label="Checks that block sending for review" className="flex flex-col gap-1 text-graphite-900">
          {problem.checks.map((check) => (
            <CheckLine key={check.id} check={check} stepNumber={numberOf(steps, check)} onSelectStep={onSelectStep} />
          ))}
        </ul>
      ) : null}
    </div>
  );
}
