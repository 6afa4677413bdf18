import type { Capability } from '@tracewright/shared';

import { StatusBadge } from '../../../components/ui/status-badge';
import { isProvisional, PROVISIONAL_BELOW_POINTS } from '../utils/capability-note';
import { ResultList } from './result-list';
import { ResultValue } from './result-value';

type CapabilityResultsProps = { capability: Capability | null; hasLimits: boolean };

/** Cp/Cpk (short-term σ) and Pp/Ppk (overall σ), with how far to trust them. */
export function CapabilityResults({ capability, hasLimits }: CapabilityResultsProps) {
  const isOneSided = capability !== null && capability.cp === null;
  return (
    <div className="flex flex-col gap-3">
      <h4 className="font-bold text-graphite-900">Capability</h4>
      {hasLimits ? null : <p className="text-graphite-700">Enter a lower limit, an upper limit or both to see capability.</p>}
      <ResultList>
        <ResultValue label="Points" value={capability?.n} />
        <ResultValue label="Cp" value={capability?.cp} note={isOneSided ? 'needs both limits' : undefined} />
        <ResultValue label="Cpk" value={capability?.cpk} note={isOneSided ? 'one-sided' : undefined} />
        <ResultValue label="Pp" value={capability?.pp} note={isOneSided ? 'needs both limits' : undefined} />
        <ResultValue label="Ppk" value={capability?.ppk} note={isOneSided ? 'one-sided' : undefined} />
      </ResultList>
      {capability && isProvisional(capability.n) ? (
        <p>
          <StatusBadge tone="warning" label={`Provisional: below ${PROVISIONAL_BELOW_POINTS} points`} />
        </p>
      ) : null}
    </div>
  );
}
