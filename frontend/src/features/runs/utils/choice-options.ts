import type { LotView } from '@tracewright/shared';

import type { LotSlot, MachineSlot } from './plan-form-values';
import { machinesOfKind, type PlanSources } from './plan-issues';

const FLAG_WORDS = { expired: 'Expired', 'past-pot-life': 'Past pot life' } as const;

/** Lots in use of the slot's material; the one picked stays listed even if archived since. */
export function lotsOfMaterial(lots: readonly LotView[], slot: LotSlot): LotView[] {
  return lots.filter(
    (lot) => lot.materialType === slot.materialType && lot.materialId === slot.materialId && (!lot.archived || String(lot.id) === slot.lotId),
  );
}

/** A lot as its option reads: number, expiry, and its flags in words (options cannot hold icons). */
export function lotOptionText(lot: LotView): string {
  const expiry = lot.expiresOn ? `expires ${lot.expiresOn}` : 'no expiry date';
  return [lot.lotNumber, expiry, ...lot.status.flags.map((flag) => FLAG_WORDS[flag])].join(' · ');
}

export function materialNameOf(slot: LotSlot, sources: PlanSources): string {
  const list = slot.materialType === 'ink' ? sources.inks : sources.substrates;
  return (
    list.find((m) => m.id === slot.materialId)?.name ??
    sources.lots.find((l) => l.materialType === slot.materialType && l.materialId === slot.materialId)?.materialName ??
    `${slot.materialType === 'ink' ? 'ink' : 'substrate'} #${slot.materialId}`
  );
}

const HEAT_WORDS = { oven: 'Oven', 'hot-plate': 'Hot plate', 'heat-press': 'Heat press', 'heat-gun': 'Heat gun' } as const;
const TREATER_WORDS = { plasma: 'Plasma treater', corona: 'Corona treater', 'uv-ozone': 'UV-ozone cleaner', 'primer-coat': 'Primer coat', 'solvent-wipe': 'Solvent wipe' } as const;
const KIND_WORDS = { printer: 'Printer', 'heat-source': 'Heat source', 'surface-treater': 'Surface treater' } as const;

export type MachineOption = { id: number; name: string; calibration: 'ok' | 'due-soon' | 'overdue' | 'not-tracked' | null };

function versionMachine(slot: MachineSlot, sources: PlanSources) {
  if (slot.kind === 'heat-source') return sources.heatSources.find((h) => h.id === slot.versionMachineId);
  if (slot.kind === 'surface-treater') return sources.treaters.find((t) => t.id === slot.versionMachineId);
  return sources.printers.find((p) => p.id === slot.versionMachineId);
}

/** What the slot is called: the kind of machine the version names ("Oven", "Plasma treater"). */
export function machineLabelOf(slot: MachineSlot, sources: PlanSources): string {
  const machine = versionMachine(slot, sources);
  if (machine && 'kind' in machine) return HEAT_WORDS[machine.kind];
  if (machine && 'method' in machine) return TREATER_WORDS[machine.method];
  return KIND_WORDS[slot.kind];
}

export function versionMachineNameOf(slot: MachineSlot, sources: PlanSources): string {
  return versionMachine(slot, sources)?.name ?? `${KIND_WORDS[slot.kind].toLowerCase()} #${slot.versionMachineId}`;
}

/** Machines that can stand in for the version's: the same kind of heat source or treatment method. */
export function machineOptionsOf(slot: MachineSlot, sources: PlanSources): MachineOption[] {
  const original = versionMachine(slot, sources);
  const sameKind = machinesOfKind(sources, slot.kind).filter((m) => {
    if (original && 'kind' in original && 'kind' in m) return m.kind === original.kind;
    if (original && 'method' in original && 'method' in m) return m.method === original.method;
    return true;
  });
  const options = sameKind.map((m) => ({ id: m.id, name: m.name, calibration: 'status' in m ? m.status.state : null }));
  if (options.some((o) => o.id === slot.versionMachineId)) return options;
  return [{ id: slot.versionMachineId, name: versionMachineNameOf(slot, sources), calibration: null }, ...options];
}
