import type { HeatSource } from '@tracewright/shared';

import { HEAT_SOURCE_KIND_LABELS } from './step-labels';

type Named = { id: number; name: string; archived: boolean };
export type RecordOption = { value: number; label: string };

/**
 * Records a picker offers: those in use, plus an archived one the version already names (marked
 * so), so an older version still shows what it pointed at.
 * @example recordOptions([{ id: 1, name: 'PET 125', archived: false }], null) // → [{ value: 1, label: 'PET 125' }]
 */
export function recordOptions<T extends Named>(records: readonly T[], current: number | null | undefined | readonly number[], describe: (r: T) => string = (r) => r.name): RecordOption[] {
  const kept = new Set(Array.isArray(current) ? current : [current]);
  return records
    .filter((r) => !r.archived || kept.has(r.id))
    .map((r) => ({ value: r.id, label: r.archived ? `${describe(r)} (archived)` : describe(r) }));
}

export const describeHeatSource = (h: HeatSource) => `${h.name} (${HEAT_SOURCE_KIND_LABELS[h.kind]}, up to ${h.maxTempC} °C)`;
