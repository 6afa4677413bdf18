import { useState } from 'react';

import type { ProcessCheck, RecipeStep } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { useBlockedAnnouncement } from '../hooks/use-blocked-announcement';
import type { DraftEvaluation } from '../utils/evaluate-draft';
import { sortChecks } from '../utils/sort-checks';
import { CheckCounts } from './check-counts';
import { CheckLine } from './check-line';

type ChecksPanelProps = { evaluation: DraftEvaluation; steps: readonly RecipeStep[]; onSelectStep: (stepId: string) => void };

/** The live process checks: Blocked, then Warning, then (on request) Pass. */
export function ChecksPanel({ evaluation, steps, onSelectStep }: ChecksPanelProps) {
  const [showPasses, setShowPasses] = useState(false);
  const announcement = useBlockedAnnouncement(evaluation.summary.blocked);
  const sorted = sortChecks(evaluation.checks);
  const open = sorted.filter((c) => c.status !== 'pass');
  const passes = sorted.filter((c) => c.status === 'pass');
  const numberOf = (stepId: string | null) => (stepId === null ? null : steps.findIndex((s) => s.id === stepId) + 1 || null);
  const invalid = steps.map((s, i) => ({ s, n: i + 1 })).filter(({ s }) => evaluation.invalidStepIds.has(s.id));
  const line = (check: ProcessCheck) => <CheckLine key={check.id} check={check} stepNumber={numberOf(check.stepId)} onSelectStep={onSelectStep} />;

  return (
    <section aria-labelledby="checks-title" className="flex min-w-0 flex-col gap-3">
      <h2 id="checks-title" className="text-lg font-bold">
        Process checks
      </h2>
      <CheckCounts summary={evaluation.summary} />
      <p role="status" className="sr-only">
        {announcement}
      </p>
      {invalid.length > 0 ? (
        <p className="flex items-start gap-2 text-sm text-graphite-800">
          <Icon name="pencil" className="mt-0.5 size-4" />
          <span>
            Left out until their fields are complete: {invalid.map(({ s, n }) => `step ${n} “${s.title}”`).join(', ')}.
          </span>
        </p>
      ) : null}
      {open.length > 0 ? <ul className="flex flex-col gap-1" aria-label="Checks that need attention">{open.map(line)}</ul> : null}
      {passes.length > 0 ? (
        <>
          <button type="button" aria-expanded={showPasses} onClick={() => setShowPasses((v) => !v)} className="inline-flex min-h-11 items-center gap-1 self-start font-bold text-copper-700">
            <Icon name={showPasses ? 'chevronDown' : 'chevronRight'} className="size-4" />
            {showPasses ? 'Hide' : 'Show'} the {passes.length} passing {passes.length === 1 ? 'check' : 'checks'}
          </button>
          {showPasses ? <ul className="flex flex-col gap-1" aria-label="Passing checks">{passes.map(line)}</ul> : null}
        </>
      ) : null}
      {evaluation.checks.length === 0 ? <p className="text-graphite-600">Nothing to check yet.</p> : null}
    </section>
  );
}
