import type { RunSummary } from '@tracewright/shared';

import { RunRow } from './run-row';

const HEAD = 'sticky top-0 z-10 whitespace-nowrap bg-graphite-100 px-3 py-2 font-bold';

export function RunsTable({ runs }: { runs: RunSummary[] }) {
  return (
    // The scroll box keeps the header in view (sticky) while a long page of runs scrolls.
    <div className="max-h-[70vh] overflow-auto rounded-md border border-graphite-300 bg-white" tabIndex={0} role="region" aria-label="Runs table">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Runs, newest first. Each run code opens the run record.</caption>
        <thead>
          <tr>
            <th scope="col" className={`${HEAD} text-left`}>Run</th>
            <th scope="col" className={`${HEAD} text-left`}>Recipe</th>
            <th scope="col" className={`${HEAD} text-left`}>State</th>
            <th scope="col" className={`${HEAD} text-right`}>Quantity (pcs)</th>
            <th scope="col" className={`${HEAD} text-left`}>Due</th>
            <th scope="col" className={`${HEAD} text-right`}>Steps done</th>
            <th scope="col" className={`${HEAD} text-right`}>Deviations not closed</th>
          </tr>
        </thead>
        <tbody>
          {runs.map((run) => (
            <RunRow key={run.id} run={run} />
          ))}
        </tbody>
      </table>
    </div>
  );
}
