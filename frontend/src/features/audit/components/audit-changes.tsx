import type { AuditEvent } from '@tracewright/shared';

import { compactJson } from '../utils/compact-json';

export function AuditChanges({ event }: { event: AuditEvent }) {
  return (
    <dl className="grid gap-3 md:grid-cols-2">
      {(['before', 'after'] as const).map((side) => (
        <div key={side}>
          <dt className="text-sm font-bold text-graphite-700">{side === 'before' ? 'Before' : 'After'}</dt>
          <dd>
            <pre className="mt-1 whitespace-pre-wrap break-all rounded-md bg-graphite-50 p-2 font-mono text-sm">{compactJson(event[side])}</pre>
          </dd>
        </div>
      ))}
    </dl>
  );
}
