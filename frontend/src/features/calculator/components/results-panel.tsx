import type { ReactNode } from 'react';

import { Icon } from '../../../components/icons/icon';
import type { Outcome } from '../utils/compute-outcome';

type ResultsPanelProps = { label: string; outcome: Outcome<unknown>; children: ReactNode };

/**
 * A polite live region, so results are read out as they change; aria-atomic is off so only the
 * changed numbers are spoken, not the whole panel on every keystroke.
 */
export function ResultsPanel({ label, outcome, children }: ResultsPanelProps) {
  return (
    <div role="status" aria-live="polite" aria-atomic="false" aria-label={label} className="flex flex-col gap-4 rounded-md border border-graphite-200 bg-paper p-4">
      <OutcomeNote outcome={outcome} />
      {children}
    </div>
  );
}

function OutcomeNote({ outcome }: { outcome: Outcome<unknown> }) {
  const problem = outcome.formError ?? (Object.keys(outcome.fieldErrors).length > 0 ? 'No result: correct the marked field above.' : null);
  if (problem) {
    return (
      <p className="flex items-start gap-2 font-bold text-oxide-700">
        <Icon name="blocked" className="mt-0.5 size-5" />
        <span>{problem}</span>
      </p>
    );
  }
  if (outcome.isIncomplete) {
    return <p className="text-graphite-700">Enter the values above to see results; fields marked optional may stay empty.</p>;
  }
  return null;
}
