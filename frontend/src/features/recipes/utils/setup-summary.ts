import type { VersionSetup } from '@tracewright/shared';

import type { ProcessRecords } from '../api/get-process-records';

/**
 * The setup in one line for the folded section: substrate, receiving material and printer.
 * @example setupSummary(setup, records) // → 'PET 125 µm · Desk printer A'
 */
export function setupSummary(setup: VersionSetup, records: ProcessRecords): string {
  const name = (list: readonly { id: number; name: string }[], id: number | null) => list.find((r) => r.id === id)?.name;
  const parts = [
    name(records.substrates, setup.substrateId) ?? 'no substrate picked',
    setup.receivingSubstrateId !== null ? `onto ${name(records.substrates, setup.receivingSubstrateId) ?? 'an unknown material'}` : null,
    name(records.printers, setup.printerId) ?? 'no printer picked',
  ];
  return parts.filter(Boolean).join(' · ');
}
