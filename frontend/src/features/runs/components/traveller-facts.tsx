import type { RunDetail } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';

type Fact = { term: string; value: string };

export function TravellerFacts({ run, printedAt }: { run: RunDetail; printedAt: Date }) {
  const facts: Fact[] = [
    { term: 'Quantity', value: `${run.quantity} ${run.quantity === 1 ? 'piece' : 'pieces'}` },
    { term: 'Due', value: run.dueOn ?? 'Not set' },
    { term: 'Planned', value: `${formatDateTime(run.createdAt)}${run.createdBy ? ` by ${run.createdBy.name}` : ''}` },
    { term: 'Printed', value: formatDateTime(printedAt.toISOString()) },
  ];
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-2 sm:grid-cols-4 print:grid-cols-4">
      {facts.map((fact) => (
        <div key={fact.term}>
          <dt className="text-sm text-graphite-700">{fact.term}</dt>
          <dd className="tabular font-bold">{fact.value}</dd>
        </div>
      ))}
    </dl>
  );
}
