import type { Trend } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { DetailSection } from './detail-section';

type Capability = NonNullable<Trend['capability']>;
const INDICES = [
  { key: 'cp', label: 'Cp', help: 'spread against the tolerance, short term' },
  { key: 'cpk', label: 'Cpk', help: 'the same, at the nearer limit' },
  { key: 'pp', label: 'Pp', help: 'spread against the tolerance, overall' },
  { key: 'ppk', label: 'Ppk', help: 'the same, at the nearer limit' },
] as const satisfies readonly { key: keyof Capability; label: string; help: string }[];

/** The indices as the API computed them; "—" where a side of the spec is missing. */
export function CapabilityPanel({ trend }: { trend: Trend }) {
  const { capability } = trend;
  return (
    <DetailSection title="Capability" className="break-inside-avoid">
      {capability ? (
        <dl className="grid grid-cols-[repeat(auto-fit,minmax(9rem,1fr))] gap-3">
          {INDICES.map((index) => (
            <div key={index.key} className="rounded-md border border-graphite-300 bg-white p-3">
              <dt className="font-bold">{index.label}</dt>
              <dd className="tabular text-3xl font-bold">{capability[index.key] === null ? '—' : capability[index.key]?.toFixed(2)}</dd>
              <dd className="text-sm text-graphite-700">{capability[index.key] === null ? 'needs both limits' : index.help}</dd>
            </div>
          ))}
          <div className="rounded-md border border-graphite-300 bg-white p-3">
            <dt className="font-bold">Points</dt>
            <dd className="tabular text-3xl font-bold">{capability.n}</dd>
            <dd className="text-sm text-graphite-700">included in the figures</dd>
          </div>
        </dl>
      ) : (
        <p className="text-graphite-700">No capability yet: it needs at least one limit on the spec and two included points.</p>
      )}
      {trend.isProvisional ? (
        <p>
          <StatusBadge tone="warning" label="Provisional: below 20 points" />
          <span className="ml-2 text-graphite-700">Read these figures as a first look, not a verdict.</span>
        </p>
      ) : null}
    </DetailSection>
  );
}
