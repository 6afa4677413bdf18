import { useId, useState } from 'react';

import type { ProcessCheck } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { CheckStatusWord } from './check-status-word';

// The rules write titles to sit inside sentences ("cure at 150 °C on …"); a line starts with a capital.
const asLine = (title: string) => title.charAt(0).toUpperCase() + title.slice(1);

const RULE = { pass: 'border-l-verdigris-700', warning: 'border-l-amber-700', blocked: 'border-l-oxide-700' } as const;

type CheckLineProps = { check: ProcessCheck; stepNumber: number | null; onSelectStep?: (stepId: string) => void };

/** One check on one line: status, title (a way to its step), the numbers, and "Why" to open. */
export function CheckLine({ check, stepNumber, onSelectStep }: CheckLineProps) {
  const [isOpen, setIsOpen] = useState(false);
  const whyId = useId();
  const stepId = check.stepId;
  return (
    <li className={`border-l-4 bg-white px-3 py-2 ${RULE[check.status]}`}>
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <CheckStatusWord status={check.status} />
        {stepId !== null && stepNumber !== null && onSelectStep ? (
          <button type="button" onClick={() => onSelectStep(stepId)} className="text-left font-bold text-graphite-900 underline decoration-graphite-400 underline-offset-4 hover:text-copper-700">
            <span className="tabular text-graphite-600">Step {stepNumber}:</span> {asLine(check.title)}
          </button>
        ) : (
          <span className="font-bold text-graphite-900">{asLine(check.title)}</span>
        )}
        {check.numbers ? <span className="tabular text-sm text-graphite-700">{check.numbers}</span> : null}
        <button type="button" aria-expanded={isOpen} aria-controls={whyId} onClick={() => setIsOpen((v) => !v)} className="ml-auto inline-flex min-h-11 items-center gap-1 px-1 text-sm font-bold text-copper-700">
          <Icon name={isOpen ? 'chevronDown' : 'chevronRight'} className="size-4" />
          Why<span className="sr-only"> “{asLine(check.title)}”</span>
        </button>
      </div>
      <p id={whyId} hidden={!isOpen} className="mt-1 max-w-prose text-graphite-800">
        {check.why}
      </p>
    </li>
  );
}
