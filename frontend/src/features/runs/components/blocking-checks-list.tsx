import type { ProcessCheck } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';

/** The checks that refused the plan with the machines chosen: each with its figures and a reason. */
export function BlockingChecksList({ checks }: { checks: ProcessCheck[] }) {
  if (checks.length === 0) return null;
  return (
    <section aria-labelledby="blocking-checks-title" className="rounded-md border-2 border-oxide-700 bg-white p-4">
      <h2 id="blocking-checks-title" className="text-lg font-bold">
        Checks that block this plan
      </h2>
      <p className="mb-3 text-graphite-700">Pick other machines, or ask an engineer to change the recipe.</p>
      <ul className="flex flex-col gap-3">
        {checks.map((check) => (
          <li key={check.id} className="flex flex-col gap-1 border-t border-graphite-200 pt-3">
            <span className="flex flex-wrap items-center gap-2">
              <StatusBadge tone="blocked" label="Blocked" />
              <span className="font-bold">{check.title}</span>
            </span>
            {check.numbers ? <span className="tabular">{check.numbers}</span> : null}
            <span className="text-graphite-700">{check.why}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
