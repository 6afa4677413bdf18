import type { RunDetail } from '@tracewright/shared';

import { formatDateTime } from '../../../lib/format-date';

export function RecordFacts({ run }: { run: RunDetail }) {
  const facts = [
    { term: 'Quantity', value: `${run.quantity} ${run.quantity === 1 ? 'piece' : 'pieces'}` },
    { term: 'Due', value: run.dueOn ?? 'Not set' },
    { term: 'Steps done', value: `${run.doneSteps} of ${run.totalSteps}` },
    { term: 'Deviations not closed', value: String(run.openDeviations) },
    { term: 'Planned', value: `${formatDateTime(run.createdAt)}${run.createdBy ? ` by ${run.createdBy.name}` : ''}` },
  ];
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-2 md:grid-cols-5 print:grid-cols-5">
      {facts.map((fact) => (
        <div key={fact.term}>
          <dt className="text-sm text-graphite-700">{fact.term}</dt>
          <dd className="tabular font-bold">{fact.value}</dd>
        </div>
      ))}
    </dl>
  );
}
