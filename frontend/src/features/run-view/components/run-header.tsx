import { Link } from 'react-router';

import { useBench } from '../hooks/bench-context';
import { BenchIcon } from './bench-icon';
import { benchButton } from './bench-button-styles';
import { OutboxBadge } from './outbox-badge';

type RunHeaderProps = { stepNumber: number; onOpenSteps: () => void; onOpenOutbox: () => void };

/** Recipe, run, where we are, who is working, and whether everything is saved. */
export function RunHeader({ stepNumber, onOpenSteps, onOpenOutbox }: RunHeaderProps) {
  const { run, person } = useBench();
  const total = run.content.steps.length;
  return (
    <header className="flex flex-wrap items-center gap-x-5 gap-y-2 border-b-2 border-graphite-700 bg-white px-4 py-2">
      <div className="flex min-w-0 flex-col">
        <span className="truncate text-base text-graphite-700">
          {run.recipeCode} · {run.recipeName} · version {run.versionNumber}
        </span>
        <span className="text-[1.5rem] font-bold tabular">Run {run.code}</span>
      </div>
      <span className="text-[1.25rem] font-bold">
        Step {stepNumber} of {total}
      </span>
      <span className="text-graphite-700">
        Operator: <span className="font-bold text-graphite-900">{person.name}</span>
      </span>
      <div className="ml-auto flex flex-wrap items-center gap-2">
        <OutboxBadge onOpen={onOpenOutbox} />
        <button type="button" className={benchButton('secondary', '', 'compact')} onClick={onOpenSteps}>
          <BenchIcon name="list" />
          All steps
        </button>
        <Link to={`/pin?next=${encodeURIComponent(`/run/${run.id}`)}`} className={benchButton('quiet', '', 'compact')}>
          Switch person
        </Link>
      </div>
    </header>
  );
}
